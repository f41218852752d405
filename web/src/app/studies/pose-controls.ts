import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  input,
  model,
  output,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatSliderModule } from '@angular/material/slider';
import type { StudyPose } from '../api-types';
import type { PoseRanges } from './pose-ranges';
import { studyLimits } from './study-form-model';

type Axis = keyof StudyPose;

interface AxisRow {
  axis: Axis;
  label: string;
  testId: string;
  unit: 'mm' | '°';
  /** Display unit per SI unit. */
  scale: number;
  /** What may be typed, SI (the contract's limits; the slider covers the useful part). */
  limits: { min: number; max: number };
}

const rows: AxisRow[] = [
  { axis: 'z', label: 'Gap', testId: 'pose-gap', unit: 'mm', scale: 1000, limits: studyLimits.gap },
  {
    axis: 'x',
    label: 'Offset x',
    testId: 'pose-x',
    unit: 'mm',
    scale: 1000,
    limits: studyLimits.offset,
  },
  {
    axis: 'y',
    label: 'Offset y',
    testId: 'pose-y',
    unit: 'mm',
    scale: 1000,
    limits: studyLimits.offset,
  },
  {
    axis: 'tiltX',
    label: 'Tilt about x',
    testId: 'pose-tiltX',
    unit: '°',
    scale: 1,
    limits: studyLimits.tilt,
  },
  {
    axis: 'tiltY',
    label: 'Tilt about y',
    testId: 'pose-tiltY',
    unit: '°',
    scale: 1,
    limits: studyLimits.tilt,
  },
];

/** A value in its display unit, without float noise (0.0045 m → "4.5"). */
function shown(value: number, scale: number): string {
  return String(Number((value * scale).toFixed(4)));
}

/**
 * The pose of the Rx: a slider and a number field per axis (gap, offsets, tilts), in mm and
 * degrees. Every slider movement (`input` events, not only the release) updates the pose, so the
 * figures and the 3D view follow the thumb. A field accepts anything within the contract's
 * limits, beyond the slider's range too.
 */
@Component({
  selector: 'app-pose-controls',
  imports: [MatButtonModule, MatSliderModule],
  templateUrl: './pose-controls.html',
  styleUrl: './pose-controls.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PoseControls {
  readonly pose = model.required<StudyPose>();
  readonly ranges = input.required<PoseRanges>();
  readonly nominal = input<StudyPose | null>(null);
  /** Emitted on every change, with the new pose (the model's own event fires too). */
  readonly moved = output<StudyPose>();

  protected readonly rows = rows;
  /** Text of each number field; the one being typed in is left alone. */
  protected readonly texts = signal<Record<Axis, string>>({
    z: '',
    x: '',
    y: '',
    tiltX: '',
    tiltY: '',
  });
  protected readonly invalid = signal<Partial<Record<Axis, string>>>({});
  private editing: Axis | null = null;

  protected readonly atNominal = computed(() => {
    const nominal = this.nominal();
    const pose = this.pose();
    return !nominal || rows.every((r) => nominal[r.axis] === pose[r.axis]);
  });

  constructor() {
    effect(() => {
      const pose = this.pose();
      this.texts.update((texts) => {
        const next = { ...texts };
        for (const r of rows)
          if (r.axis !== this.editing) next[r.axis] = shown(pose[r.axis], r.scale);
        return next;
      });
    });
  }

  protected sliderMin(row: AxisRow): number {
    return this.ranges()[row.axis].min * row.scale;
  }
  protected sliderMax(row: AxisRow): number {
    return this.ranges()[row.axis].max * row.scale;
  }
  protected sliderStep(row: AxisRow): number {
    return Number((this.ranges()[row.axis].step * row.scale).toPrecision(6));
  }
  protected sliderValue(row: AxisRow): number {
    const value = this.pose()[row.axis] * row.scale;
    return Math.min(this.sliderMax(row), Math.max(this.sliderMin(row), value));
  }

  protected slid(row: AxisRow, event: Event): void {
    const value = (event.target as HTMLInputElement).valueAsNumber;
    if (Number.isFinite(value)) this.set(row, value / row.scale);
  }

  protected typed(row: AxisRow, event: Event): void {
    this.editing = row.axis;
    const text = (event.target as HTMLInputElement).value;
    this.texts.update((t) => ({ ...t, [row.axis]: text }));
    const value = Number(text) / row.scale;
    const { min, max } = row.limits;
    if (text.trim() === '' || !Number.isFinite(value) || value < min || value > max) {
      const range = `${shown(min, row.scale)} to ${shown(max, row.scale)} ${row.unit}`;
      this.invalid.update((i) => ({ ...i, [row.axis]: `Allowed: ${range}` }));
      return;
    }
    this.invalid.update((i) => ({ ...i, [row.axis]: undefined }));
    this.set(row, value);
  }

  protected left(row: AxisRow): void {
    this.editing = null;
    this.invalid.update((i) => ({ ...i, [row.axis]: undefined }));
    this.texts.update((t) => ({ ...t, [row.axis]: shown(this.pose()[row.axis], row.scale) }));
  }

  protected reset(): void {
    const nominal = this.nominal();
    if (!nominal) return;
    this.invalid.set({});
    this.pose.set({ ...nominal });
    this.moved.emit(this.pose());
  }

  private set(row: AxisRow, value: number): void {
    if (this.pose()[row.axis] === value) return;
    this.pose.update((p) => ({ ...p, [row.axis]: value }));
    this.moved.emit(this.pose());
  }
}
