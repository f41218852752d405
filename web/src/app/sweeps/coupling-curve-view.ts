import { ChangeDetectionStrategy, Component, computed, input, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import type { StudyResponse, SweepRunResponse } from '../api-types';
import { lengthMm } from './coupling-map-csv';
import { couplingCurveFigure } from './coupling-curve-figure';
import { fileSlug, saveTextFile } from './save-text-file';
import { curveAxisOf, sweepCurve } from './sweep-curve';
import { SweepPlot } from './sweep-plot';

/** k and η_max against the gap (gap sweep) or a tilt (tilt sweep), with the threshold line. */
@Component({
  selector: 'app-coupling-curve-view',
  imports: [MatButtonModule, MatMenuModule, SweepPlot],
  template: `
    @if (figure(); as fig) {
      <div class="curve-bar">
        <span class="muted">{{ caption() }}</span>
        <span class="spacer"></span>
        <button mat-stroked-button type="button" [matMenuTriggerFor]="exports">Export</button>
        <mat-menu #exports="matMenu">
          <button mat-menu-item type="button" (click)="exportCsv()">
            Curve as CSV ({{ csvColumns() }})
          </button>
          <button mat-menu-item type="button" (click)="exportPng()">Plot as PNG</button>
        </mat-menu>
      </div>
      <app-sweep-plot
        [testId]="testId()"
        [figure]="fig"
        [label]="'Coupling coefficient k and efficiency against ' + axisWord()"
      />
    }
  `,
  styles: `
    .curve-bar {
      display: flex;
      align-items: center;
      gap: 12px;
      margin-bottom: 8px;
    }
    .spacer {
      flex: 1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CouplingCurveView {
  /** A succeeded gap or tilt run, with its result. */
  readonly run = input.required<SweepRunResponse>();
  readonly study = input.required<StudyResponse>();

  private readonly plot = viewChild(SweepPlot);

  private readonly axis = computed(() => {
    const axes = this.run().result?.axes;
    return axes ? curveAxisOf(axes) : 'z';
  });
  protected readonly axisWord = computed(() =>
    this.axis() === 'z' ? 'the gap' : `the tilt about ${this.axis() === 'tiltX' ? 'x' : 'y'}`,
  );
  protected readonly testId = computed(() => (this.axis() === 'z' ? 'gap-curve' : 'tilt-curve'));
  protected readonly csvColumns = computed(() =>
    this.axis() === 'z' ? 'gap_mm, k, eta_max' : 'tilt_deg, k, eta_max',
  );

  private readonly curves = computed(() => {
    const result = this.run().result;
    if (!result) return null;
    const axis = this.axis();
    return {
      k: sweepCurve(result.axes, result.k, axis),
      eta: sweepCurve(result.axes, result.etaMax, axis),
    };
  });

  protected readonly caption = computed(() => {
    const k = this.curves()?.k.values ?? [];
    if (k.length === 0) return '';
    return `k from ${Math.min(...k).toPrecision(3)} to ${Math.max(...k).toPrecision(3)}`;
  });

  protected readonly figure = computed(() => {
    const curves = this.curves();
    if (!curves) return null;
    const gap = this.axis() === 'z';
    const tiltName = this.axis() === 'tiltX' ? 'Tilt about x' : 'Tilt about y';
    return couplingCurveFigure({
      at: gap ? curves.k.at.map((m) => m * 1000) : curves.k.at,
      k: curves.k.values,
      eta: curves.eta.values,
      axisTitle: gap ? 'Gap (mm)' : `${tiltName} (°)`,
      unit: gap ? 'mm' : '°',
      threshold: this.study().threshold,
      uirevision: this.run().id,
    });
  });

  protected exportCsv(): void {
    const curves = this.curves();
    if (!curves) return;
    const gap = this.axis() === 'z';
    const lines = [gap ? 'gap_mm,k,eta_max' : 'tilt_deg,k,eta_max'];
    curves.k.at.forEach((at, i) =>
      lines.push(
        [
          gap ? lengthMm(at) : String(at),
          String(Number(curves.k.values[i].toPrecision(8))),
          String(Number(curves.eta.values[i].toPrecision(8))),
        ].join(','),
      ),
    );
    saveTextFile(`${this.baseName()}.csv`, lines.join('\n') + '\n', 'text/csv');
  }

  protected exportPng(): void {
    void this.plot()?.savePng(`${this.baseName()}.png`);
  }

  private baseName(): string {
    return `${fileSlug(this.study().name)}-${this.axis() === 'z' ? 'gap' : 'tilt'}-curve`;
  }
}
