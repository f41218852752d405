import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Threshold } from '../api-types';
import { formatQuantity } from '../units/format-quantity';
import type { LiveFigures } from './live-link-messages';
import { thresholdText } from './threshold-text';

/** A figure as the panel lists it. */
interface Row {
  label: string;
  value: string;
  testId?: string;
  title?: string;
}

/**
 * The link figures of the current pose, as the worker computed them: k and η_max large, with the
 * study's threshold beside them, then M, the inductances, Q, voltages and capacitors. Keeps the
 * last figures (dimmed) while a pose cannot be computed, and says why.
 */
@Component({
  selector: 'app-live-figures-panel',
  templateUrl: './live-figures-panel.html',
  styleUrl: './live-figures-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LiveFiguresPanel {
  readonly figures = input<LiveFigures | null>(null);
  readonly threshold = input.required<Threshold>();
  readonly currentA = input.required<number>();
  readonly poseError = input<string | null>(null);
  readonly setupError = input<string | null>(null);
  readonly preparing = input(false);
  readonly roundTripMs = input<number | null>(null);
  readonly timing = input<{ median: number; max: number; count: number } | null>(null);

  protected readonly thresholdLabel = computed(() => thresholdText(this.threshold()));

  /** Whether the pose meets the threshold, and by what measure. */
  protected readonly verdict = computed(() => {
    const f = this.figures();
    if (!f) return null;
    const t = this.threshold();
    const value = t.kind === 'k' ? Math.abs(f.k) : f.etaMax;
    return { meets: value >= t.value, fraction: Math.min(1, value / t.value / 2) };
  });

  protected readonly k = computed(() => {
    const f = this.figures();
    return f ? f.k.toFixed(3) : '—';
  });
  protected readonly eta = computed(() => {
    const f = this.figures();
    return f ? `${(f.etaMax * 100).toFixed(1)} %` : '—';
  });
  protected readonly M = computed(() => {
    const f = this.figures();
    return f ? formatQuantity(f.M, 'H') : '—';
  });

  protected readonly rows = computed<Row[]>(() => {
    const f = this.figures();
    if (!f) return [];
    const amps = formatQuantity(this.currentA(), 'A', { trim: true });
    const sp = f.compensation === 'series-parallel';
    const rows: Row[] = [
      { label: 'L1 (Tx)', value: formatQuantity(f.L1, 'H') },
      {
        label: 'L2 (Rx, in pose)',
        value: formatQuantity(f.L2, 'H'),
        title: 'Raised near a Tx ferrite backing by the Rx’s own image',
      },
      { label: 'Q1 · Q2', value: `${f.Q1.toPrecision(3)} · ${f.Q2.toPrecision(3)}` },
      {
        label: `Induced V2 = ωM·I1`,
        value: formatQuantity(f.inducedVoltage, 'V'),
        testId: 'live-v2',
        title: `Open-circuit Rx voltage at ${amps} rms in the Tx`,
      },
      {
        label: `Tx voltage ωL1·I1`,
        value: formatQuantity(f.resonantVoltageTx, 'V'),
        testId: 'live-vtx',
        title: `Across the Tx coil and its series capacitor at ${amps} rms`,
      },
      {
        label: 'C1 (Tx, series)',
        value: formatQuantity(f.C1, 'F'),
        testId: 'live-c1',
        title: sp ? '1/(ω²(L1 − M²/L2)): tunes the Tx with a parallel Rx' : '1/(ω²L1)',
      },
      {
        label: sp ? 'C2 (Rx, parallel)' : 'C2 (Rx, series)',
        value: formatQuantity(f.C2, 'F'),
        testId: 'live-c2',
        title: '1/(ω²L2)',
      },
    ];
    if (!sp) {
      rows.push({
        label: 'Load for η_max',
        value: formatQuantity(f.optimalLoad, 'Ω'),
        title: 'In series with the resonant Rx: R2·sqrt(1 + k²Q1Q2)',
      });
    }
    return rows;
  });

  protected readonly timingText = computed(() => {
    const ms = this.roundTripMs();
    if (ms === null) return null;
    return `computed in ${ms < 10 ? ms.toFixed(1) : ms.toFixed(0)} ms`;
  });
  protected readonly timingTitle = computed(() => {
    const t = this.timing();
    if (!t) return '';
    return (
      `Round trip page → worker → page. Median ${t.median.toFixed(1)} ms, ` +
      `slowest ${t.max.toFixed(1)} ms over the last ${t.count} poses.`
    );
  });
}
