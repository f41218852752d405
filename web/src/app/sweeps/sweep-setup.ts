import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  output,
  untracked,
} from '@angular/core';
import { takeUntilDestroyed, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import {
  Observable,
  catchError,
  debounceTime,
  distinctUntilChanged,
  map,
  of,
  startWith,
  switchMap,
} from 'rxjs';
import { apiProblem } from '../api-problem';
import type {
  CreateSweepRequest,
  StudyResponse,
  SweepEstimateResponse,
  SweepKind,
} from '../api-types';
import { QuantityField } from '../units/quantity-field';
import { formatDuration } from './format-duration';
import { sweepDefaults } from './sweep-defaults';
import { sweepKindLabels, sweepKindOrder } from './sweep-labels';
import { SweepRangeFields, type RangeGroup } from './sweep-range-fields';
import { sweepRequest, type RangeValue, type SweepSetupValue } from './sweep-request';
import { SweepsApi } from './sweeps-api';

/** Typing pauses this long before the server is asked for an estimate. */
export const estimateDebounceMs = 400;
/** Above this estimate the set-up warns that the run takes a while (common practice, no source). */
export const longRunSeconds = 60;

type EstimateState =
  | { state: 'none' }
  | { state: 'loading' }
  | { state: 'done'; estimate: SweepEstimateResponse }
  | { state: 'error'; message: string };

/** Editors only: what to sweep, what it will cost, and Run. */
@Component({
  selector: 'app-sweep-setup',
  imports: [
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatSelectModule,
    QuantityField,
    ReactiveFormsModule,
    SweepRangeFields,
  ],
  templateUrl: './sweep-setup.html',
  styleUrl: './sweep-setup.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepSetup {
  private readonly api = inject(SweepsApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly workspaceId = input.required<string>();
  readonly study = input.required<StudyResponse>();
  /** A run of this study is queued or running: one at a time from here. */
  readonly busy = input(false);
  /** A run request is on its way to the server. */
  readonly starting = input(false);
  readonly run = output<CreateSweepRequest>();

  protected readonly kindLabels = sweepKindLabels;
  protected readonly kinds = sweepKindOrder;

  protected readonly form = this.fb.group({
    kind: this.fb.control<SweepKind>('xy-map'),
    map: this.fb.group({ x: this.range(), y: this.range(), gap: this.length() }),
    gap: this.fb.group({ gaps: this.range() }),
    tilt: this.fb.group({
      axis: this.fb.control<'tiltX' | 'tiltY'>('tiltX'),
      tilt: this.range(),
      gap: this.length(),
    }),
    stack: this.fb.group({ x: this.range(), y: this.range(), gaps: this.range() }),
  });

  private readonly value = toSignal(
    this.form.valueChanges.pipe(map(() => this.form.getRawValue() as SweepSetupValue)),
    { initialValue: this.form.getRawValue() as SweepSetupValue },
  );
  protected readonly kind = computed(() => this.value().kind);
  protected readonly request = computed(() => sweepRequest(this.value(), this.study().nominalPose));
  protected readonly problem = computed(() => {
    const r = this.request();
    return 'problem' in r ? r.problem : null;
  });

  protected readonly estimate = toSignal(
    toObservable(this.request).pipe(
      map((r) => ('request' in r ? r.request : null)),
      distinctUntilChanged((a, b) => JSON.stringify(a) === JSON.stringify(b)),
      debounceTime(estimateDebounceMs),
      switchMap((request) => (request ? this.ask(request) : of<EstimateState>({ state: 'none' }))),
      takeUntilDestroyed(),
    ),
    { initialValue: { state: 'none' } as EstimateState },
  );
  protected readonly estimateText = computed(() => {
    const e = this.estimate();
    if (e.state !== 'done') return null;
    const poses = e.estimate.poses.toLocaleString('en');
    const seconds = e.estimate.estimatedSeconds;
    const time = seconds < 1 ? formatDuration(seconds) : `about ${formatDuration(seconds)}`;
    return `${poses} poses · ${time} on the server`;
  });
  protected readonly estimateError = computed(() => {
    const e = this.estimate();
    return e.state === 'error' ? e.message : null;
  });
  protected readonly slow = computed(() => {
    const e = this.estimate();
    return e.state === 'done' && e.estimate.estimatedSeconds > longRunSeconds;
  });
  protected readonly canRun = computed(
    () => !this.busy() && !this.starting() && 'request' in this.request(),
  );

  constructor() {
    // The ranges follow the study (its coils and nominal pose) until the user edits them.
    effect(() => {
      const defaults = sweepDefaults(this.study());
      untracked(() => {
        if (!this.form.pristine) return;
        this.form.setValue({ ...defaults, kind: this.form.controls.kind.value });
        this.form.markAsPristine();
      });
    });
  }

  protected start(): void {
    const r = this.request();
    if ('request' in r && this.canRun()) this.run.emit(r.request);
  }

  protected resetDefaults(): void {
    const kind = this.form.controls.kind.value;
    this.form.setValue({ ...sweepDefaults(this.study()), kind });
    this.form.markAsPristine();
  }

  protected group(kind: 'map' | 'stack', axis: 'x' | 'y'): RangeGroup {
    return this.form.controls[kind].controls[axis];
  }

  private ask(request: CreateSweepRequest): Observable<EstimateState> {
    return this.api.estimate(this.workspaceId(), this.study().id, request).pipe(
      map((estimate): EstimateState => ({ state: 'done', estimate })),
      catchError((error: unknown) =>
        of<EstimateState>({ state: 'error', message: apiProblem(error).message }),
      ),
      startWith<EstimateState>({ state: 'loading' }),
    );
  }

  private range(): RangeGroup {
    const empty: RangeValue = { from: null, to: null, steps: null };
    return this.fb.group({
      from: new FormControl<number | null>(empty.from),
      to: new FormControl<number | null>(empty.to),
      steps: new FormControl<number | null>(empty.steps),
    });
  }

  private length(): FormControl<number | null> {
    return new FormControl<number | null>(null);
  }
}
