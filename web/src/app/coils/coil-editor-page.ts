import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import type { AbstractControl } from '@angular/forms';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import { debounceTime, map, of, startWith, switchMap } from 'rxjs';
import { apiProblem } from '../api-problem';
import type { CoilResponse } from '../api-types';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { QuantityField } from '../units/quantity-field';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { applyCoilIssues } from './apply-coil-issues';
import { CoilActions } from './coil-actions';
import { CoilConductorFields } from './coil-conductor-fields';
import { CoilDrawing } from './coil-drawing';
import { coilFieldHints } from './coil-field-hints';
import { CoilFiguresEngine } from './coil-figures-engine';
import { CoilFiguresPanel, type FiguresState } from './coil-figures-panel';
import { createCoilForm } from './coil-form';
import { coilFormIssues, type CoilFormCheck, type CoilFormIssue } from './coil-form-issues';
import { CoilGeometryFields } from './coil-geometry-fields';
import { coilKindOptions } from './coil-kind-labels';
import { canEditCoils } from './coil-role';
import { CoilSaver, type SaveOutcome } from './coil-saver';
import { CoilsApi } from './coils-api';
import { applyKindStart, fillCoilForm } from './fill-coil-form';

/** Debounce of the live check and figures: fast enough to feel live, slow enough to skip keys. */
const LIVE_DELAY_MS = 150;

/** `/w/:workspaceId/coils/new` and `/w/:workspaceId/coils/:coilId`: one coil, live figures. */
@Component({
  selector: 'app-coil-editor-page',
  imports: [
    CoilConductorFields,
    CoilDrawing,
    CoilFiguresPanel,
    CoilGeometryFields,
    DatePipe,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatTooltipModule,
    ProblemBanner,
    QuantityField,
    ReactiveFormsModule,
    RouterLink,
    StatusPanel,
  ],
  providers: [CoilFiguresEngine, CoilSaver],
  templateUrl: './coil-editor-page.html',
  styleUrl: './coil-editor-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilEditorPage {
  /** Route parameter; missing on `/coils/new`. */
  readonly coilId = input<string | undefined>(undefined);

  private readonly api = inject(CoilsApi);
  private readonly actions = inject(CoilActions);
  private readonly saver = inject(CoilSaver);
  private readonly engine = inject(CoilFiguresEngine);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly context = inject(WorkspaceContext);

  protected readonly form = createCoilForm();
  protected readonly value = signal(this.form.getRawValue());
  protected readonly hints = coilFieldHints;
  protected readonly kindOptions = coilKindOptions;

  protected readonly isNew = computed(() => !this.coilId());
  protected readonly editable = computed(() => canEditCoils(this.context.role()));
  protected readonly stored = this.api.coilResource(
    () => this.context.id(),
    () => this.coilId(),
  );
  protected readonly loadProblem = computed(() => {
    const error = this.stored.error();
    return error ? apiProblem(error) : null;
  });
  /** The version the form was loaded from (or last saved as). */
  protected readonly loaded = signal<CoilResponse | null>(null);
  protected readonly check = signal<CoilFormCheck | null>(null);
  protected readonly pageIssues = signal<CoilFormIssue[]>([]);
  protected readonly ringsError = computed(
    () => this.pageIssues().find((issue) => issue.control === 'rings')?.message ?? null,
  );
  protected readonly otherIssues = computed(() =>
    this.pageIssues().filter((issue) => issue.control !== 'rings'),
  );
  protected readonly figures = signal<FiguresState>({ status: 'waiting' });
  protected readonly saving = signal(false);
  protected readonly banner = signal<string | null>(null);
  /** A save refused because someone else saved first: the version now stored. */
  protected readonly stale = signal<number | null>(null);
  protected readonly dirty = signal(false);
  private readonly flagged = new Set<AbstractControl>();

  constructor() {
    this.followForm();
    // A stored coil fills the form once; later answers (after a save) do not overwrite edits.
    effect(() => {
      const coil = this.stored.hasValue() ? this.stored.value() : null;
      untracked(() => {
        if (coil && this.loaded()?.id !== coil.id) this.load(coil);
      });
    });
    effect(() => {
      if (this.isNew()) untracked(() => this.startNew());
    });
    // Readers see the same form, disabled: the values and figures, no way to change them.
    effect(() => {
      const editable = this.editable();
      untracked(() => (editable ? this.form.enable() : this.form.disable()));
    });
  }

  protected readonly canSave = computed(() => this.editable() && !this.saving());
  protected readonly hasChanges = computed(() => this.dirty() || this.isNew());

  protected kindChanged(): void {
    applyKindStart(this.form, this.form.controls.kind.value);
  }

  protected save(overwrite = false): void {
    this.form.markAllAsTouched();
    const check = this.runCheck(this.form.getRawValue());
    const workspaceId = this.context.id();
    if (!workspaceId || !check.coil || this.form.invalid) {
      this.banner.set('Some fields need attention before the coil can be saved; see the marks.');
      return;
    }
    const current = this.loaded();
    const version = overwrite && this.stale() !== null ? this.stale()! : current?.version;
    this.banner.set(null);
    this.saving.set(true);
    this.saver
      .save({ workspaceId, form: this.form, coil: check.coil, existing: current, version })
      .subscribe((outcome) => this.saved(outcome));
  }

  /** Drops the user's edits for the version now stored. */
  protected reload(): void {
    const current = this.loaded();
    if (!current) return;
    this.api.get(current.workspaceId, current.id).subscribe({
      next: (coil) => {
        this.stale.set(null);
        this.banner.set(null);
        this.load(coil);
      },
      error: (error: unknown) => this.banner.set(apiProblem(error).message),
    });
  }

  protected duplicate(): void {
    const coil = this.loaded();
    if (!coil) return;
    this.actions
      .duplicate(coil)
      .subscribe((copy) => void this.router.navigate(['/w', copy.workspaceId, 'coils', copy.id]));
  }

  protected remove(): void {
    const coil = this.loaded();
    if (!coil) return;
    this.actions.delete(coil).subscribe((outcome) => {
      if (outcome === 'deleted') void this.router.navigate(['/w', coil.workspaceId, 'coils']);
    });
  }

  private saved(outcome: SaveOutcome): void {
    this.saving.set(false);
    switch (outcome.kind) {
      case 'saved': {
        const created = !this.loaded();
        this.stale.set(null);
        this.loaded.set(outcome.coil);
        this.form.markAsPristine();
        this.dirty.set(false);
        this.snackBar.open(`Saved “${outcome.coil.name}”.`, 'Dismiss', { duration: 4000 });
        if (created) {
          void this.router.navigate(['/w', outcome.coil.workspaceId, 'coils', outcome.coil.id], {
            replaceUrl: true,
          });
        }
        break;
      }
      case 'stale':
        this.stale.set(outcome.currentVersion);
        break;
      case 'failed':
        this.banner.set(outcome.message);
        break;
    }
  }

  private load(coil: CoilResponse): void {
    this.loaded.set(coil);
    fillCoilForm(this.form, coil);
    this.dirty.set(false);
  }

  private startNew(): void {
    this.form.patchValue({ kind: 'circular-spiral', operatingFrequencyHz: 128e3 });
    applyKindStart(this.form, 'circular-spiral');
    this.form.markAsPristine();
  }

  /** Live check and figures as the user types: debounced, the latest request wins. */
  private followForm(): void {
    this.form.valueChanges
      .pipe(
        startWith(null),
        map(() => {
          const value = this.form.getRawValue();
          this.value.set(value);
          this.dirty.set(this.form.dirty);
          return value;
        }),
        debounceTime(LIVE_DELAY_MS),
        map((value) => ({ value, check: this.runCheck(value) })),
        switchMap(({ value, check }) => {
          if (check.issues.length > 0 && check.issues.every((issue) => issue.missing)) {
            return of<FiguresState>({ status: 'waiting' });
          }
          const previous = this.shownFigures();
          return this.engine
            .compute({
              spec: check.coil ?? check.spec,
              frequency: positive(value.operatingFrequencyHz),
              current: value.ratedCurrentA,
            })
            .pipe(
              map((answer): FiguresState =>
                'figures' in answer
                  ? { status: 'ready', figures: answer.figures }
                  : { status: 'error', message: answer.error },
              ),
              startWith<FiguresState>({ status: 'computing', previous }),
            );
        }),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe((state) => this.figures.set(state));
  }

  private runCheck(value: ReturnType<typeof this.form.getRawValue>): CoilFormCheck {
    const check = coilFormIssues(value);
    this.check.set(check);
    this.pageIssues.set(applyCoilIssues(this.form, check.issues, this.flagged));
    return check;
  }

  private shownFigures() {
    const state = this.figures();
    if (state.status === 'ready') return state.figures;
    return state.status === 'computing' ? state.previous : null;
  }
}

function positive(value: number | null): number | null {
  return value !== null && value > 0 ? value : null;
}
