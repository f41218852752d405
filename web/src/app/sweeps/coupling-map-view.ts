import {
  ChangeDetectionStrategy,
  Component,
  computed,
  input,
  linkedSignal,
  output,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { MatSliderModule } from '@angular/material/slider';
import type { StudyResponse, SweepEnvelope, SweepRunResponse } from '../api-types';
import { formatQuantity } from '../units/format-quantity';
import { couplingMapCsv } from './coupling-map-csv';
import { couplingMapFigure } from './coupling-map-figure';
import { envelopeCsv, envelopeJson } from './envelope-export';
import type { PlotPoint } from './plot-renderer';
import { fileSlug, saveTextFile } from './save-text-file';
import { sweepMatrix } from './sweep-matrix';
import { SweepPlot } from './sweep-plot';
import type { SelectedPose } from './selected-pose';

/** Envelopes are matched to their gap within this: far below any gap step (1 nm). */
const gapMatch = 1e-9;

/**
 * The x–y coupling map of an xy-map run, or of one gap of a stack, with the tolerance envelope
 * and its figures beside it, and the exports the mechanical team takes from it.
 */
@Component({
  selector: 'app-coupling-map-view',
  imports: [MatButtonModule, MatMenuModule, MatSliderModule, SweepPlot],
  templateUrl: './coupling-map-view.html',
  styleUrl: './coupling-map-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CouplingMapView {
  /** A succeeded xy-map or xy-stack run, with its result. */
  readonly run = input.required<SweepRunResponse>();
  readonly study = input.required<StudyResponse>();
  readonly poseSelected = output<SelectedPose>();

  private readonly plot = viewChild(SweepPlot);

  protected readonly axes = computed(() => this.run().result?.axes ?? null);
  protected readonly gaps = computed(() => this.axes()?.z ?? []);
  /** The gap shown: the one nearest the nominal gap when a run opens, then the user's choice. */
  protected readonly gapIndex = linkedSignal(() => {
    const nominal = this.study().nominalPose.z;
    const gaps = this.gaps();
    let best = 0;
    gaps.forEach((g, i) => {
      if (Math.abs(g - nominal) < Math.abs(gaps[best] - nominal)) best = i;
    });
    return best;
  });
  protected readonly gap = computed(() => this.gaps()[this.gapIndex()] ?? 0);

  protected readonly k = computed(() => {
    const result = this.run().result;
    return result ? sweepMatrix(result.axes, result.k, { z: this.gapIndex() }) : null;
  });
  protected readonly eta = computed(() => {
    const result = this.run().result;
    return result ? sweepMatrix(result.axes, result.etaMax, { z: this.gapIndex() }) : null;
  });
  protected readonly envelope = computed<SweepEnvelope | null>(() => {
    const gap = this.gap();
    return this.run().result?.envelopes.find((e) => Math.abs(e.z - gap) < gapMatch) ?? null;
  });

  protected readonly figure = computed(() => {
    const k = this.k();
    const eta = this.eta();
    if (!k || !eta) return null;
    const { x, y } = this.study().nominalPose;
    return couplingMapFigure({
      k,
      eta,
      envelope: this.envelope(),
      nominal: { x, y },
      uirevision: `${this.run().id}:${this.gapIndex()}`,
    });
  });

  protected readonly threshold = computed(() => {
    const t = this.study().threshold;
    const kAt = this.envelope()?.thresholdK;
    if (t.kind === 'k') return `k ≥ ${t.value}`;
    const eta = `η_max ≥ ${Number((t.value * 100).toPrecision(4))} %`;
    return kAt === undefined ? eta : `${eta}, i.e. k ≥ ${kAt.toPrecision(3)} with these coils`;
  });
  protected readonly area = computed(() => {
    const e = this.envelope();
    if (!e) return null;
    const mm2 = e.area * 1e6;
    return `${mm2.toLocaleString('en', { maximumSignificantDigits: 3 })} mm²`;
  });
  protected readonly radius = computed(() => {
    const e = this.envelope();
    return e ? formatQuantity(e.chargeRadius, 'm') : null;
  });
  protected readonly worst = computed(() => {
    const w = this.envelope()?.worst;
    if (!w) return null;
    return `k ${w.value.toPrecision(3)} at x ${this.length(w.x)}, y ${this.length(w.y)}`;
  });
  protected readonly nominal = computed(() => {
    const n = this.envelope()?.nominal;
    if (!n) return null;
    if (n.value === null) return 'outside the map';
    return `k ${n.value.toPrecision(3)}${n.meets ? '' : ' — below the threshold'}`;
  });
  protected readonly gapLabel = (g: number) => formatQuantity(g, 'm');
  /** The slider's label for a gap index (the slider runs over indices, the gaps may be uneven). */
  protected readonly gapText = (index: number) => this.gapLabel(this.gaps()[index] ?? 0);

  protected clicked(point: PlotPoint): void {
    const axes = this.axes();
    // Only the map's own samples move the Rx; the markers on top are read-outs.
    if (!axes || point.trace !== 0) return;
    this.poseSelected.emit({
      x: point.x / 1000,
      y: point.y / 1000,
      z: this.gap(),
      tiltX: axes.tiltX[0],
      tiltY: axes.tiltY[0],
    });
  }

  protected exportMap(): void {
    const k = this.k();
    const eta = this.eta();
    if (k && eta) saveTextFile(`${this.baseName()}-map.csv`, couplingMapCsv(k, eta), 'text/csv');
  }

  protected exportEnvelope(format: 'csv' | 'json'): void {
    const e = this.envelope();
    if (!e) return;
    const run = this.run();
    if (format === 'csv') {
      saveTextFile(`${this.baseName()}-envelope.csv`, envelopeCsv(e), 'text/csv');
      return;
    }
    const source = {
      study: this.study().name,
      runId: run.id,
      engineVersion: run.engineVersion,
      computedAt: run.finishedAt,
    };
    saveTextFile(`${this.baseName()}-envelope.json`, envelopeJson(e, source), 'application/json');
  }

  protected exportPng(): void {
    void this.plot()?.savePng(`${this.baseName()}-map.png`);
  }

  private baseName(): string {
    const gapMm = Number((this.gap() * 1000).toFixed(3));
    return `${fileSlug(this.study().name)}-gap-${gapMm}mm`;
  }

  private length(m: number): string {
    return formatQuantity(m, 'm');
  }
}
