import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  inject,
  signal,
} from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { apiProblem } from '../api-problem';
import type { StudyResponse } from '../api-types';
import { formProblem } from '../form-problem';
import { ProblemBanner } from '../shell/problem-banner';
import { QuantityField } from '../units/quantity-field';
import { formatQuantity } from '../units/format-quantity';
import { StudiesApi } from './studies-api';
import {
  buildStudyForm,
  changedFields,
  formFieldPath,
  studyFormValue,
  studyLimits,
  studyRequest,
} from './study-form-model';

export interface StudyFormDialogData {
  workspaceId: string;
  /** The study to edit; absent for a new one. */
  study?: StudyResponse;
}

/** What a refused save found: the latest version, and what changed in it. */
interface StaleState {
  latest: StudyResponse | null;
  changed: string[];
  loading: boolean;
}

/**
 * The study form, new and edit: the pair from the coil library, the operating point, the
 * threshold the power stage needs and the nominal pose. Saves with the version it was opened on;
 * a refused (stale) save keeps every edit and offers the latest version to compare with.
 * Closes with the saved study.
 */
@Component({
  selector: 'app-study-form-dialog',
  imports: [
    MatButtonModule,
    MatButtonToggleModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ProblemBanner,
    QuantityField,
    ReactiveFormsModule,
  ],
  templateUrl: './study-form-dialog.html',
  styleUrl: './study-form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyFormDialog {
  private readonly api = inject(StudiesApi);
  private readonly dialogRef = inject<MatDialogRef<StudyFormDialog, StudyResponse>>(MatDialogRef);
  protected readonly data = inject<StudyFormDialogData>(MAT_DIALOG_DATA);

  protected readonly limits = studyLimits;
  protected readonly form = buildStudyForm(inject(NonNullableFormBuilder));
  protected readonly coils = this.api.coilsResource(() => this.data.workspaceId);
  protected readonly coilList = computed(() =>
    this.coils.hasValue() ? this.coils.value().items : [],
  );
  protected readonly coilsProblem = computed(() => {
    const error = this.coils.error();
    return error ? apiProblem(error).message : null;
  });

  protected readonly saving = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly stale = signal<StaleState | null>(null);
  /** The version a save sends: the one opened, or the latest once the user has looked at it. */
  private readonly baseVersion = signal(this.data.study?.version ?? 0);
  private base = this.data.study ?? null;

  protected readonly thresholdKind = toSignal(this.form.controls.thresholdKind.valueChanges, {
    initialValue: this.form.controls.thresholdKind.value,
  });
  private readonly rxCoilId = toSignal(this.form.controls.rxCoilId.valueChanges, {
    initialValue: this.form.controls.rxCoilId.value,
  });
  /** preparePair models a Tx backing only; an Rx with one cannot be computed. */
  protected readonly rxBacked = computed(() => {
    const coil = this.coilList().find((c) => c.id === this.rxCoilId());
    return coil?.spec.backing !== undefined;
  });

  constructor() {
    if (this.data.study) this.form.setValue(studyFormValue(this.data.study));
    // The value's rule depends on the kind: check it again when the toggle moves.
    this.form.controls.thresholdKind.valueChanges
      .pipe(takeUntilDestroyed(inject(DestroyRef)))
      .subscribe(() => this.form.controls.thresholdValue.updateValueAndValidity());
  }

  protected coilFigure(id: string): string {
    const coil = this.coilList().find((c) => c.id === id);
    if (!coil) return '';
    return `${coil.kind} · L ${formatQuantity(coil.figures.L, 'H')}`;
  }

  protected save(): void {
    this.banner.set(null);
    if (this.form.invalid || this.rxBacked()) {
      this.form.markAllAsTouched();
      this.banner.set(this.rxBacked() ? null : 'Some fields need attention; see the messages.');
      return;
    }
    const request = studyRequest(this.form);
    const study = this.data.study;
    this.saving.set(true);
    const call = study
      ? this.api.update(this.data.workspaceId, study.id, {
          ...request,
          version: this.baseVersion(),
        })
      : this.api.create(this.data.workspaceId, request);
    call.subscribe({
      next: (saved) => {
        this.saving.set(false);
        this.dialogRef.close(saved);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const problem = apiProblem(error);
        if (problem.code === 'stale_version') {
          this.stale.set({ latest: null, changed: [], loading: false });
          return;
        }
        if (problem.field) problem.field = formFieldPath(problem.field);
        this.banner.set(formProblem(this.form, problem));
      },
    });
  }

  /** Fetches the latest version; the user's edits stay in the form. */
  protected reloadLatest(): void {
    const study = this.data.study;
    if (!study) return;
    this.stale.update((s) => (s ? { ...s, loading: true } : s));
    this.api.get(this.data.workspaceId, study.id).subscribe({
      next: (latest) => {
        const changed = this.base ? changedFields(this.base, latest) : [];
        this.base = latest;
        this.baseVersion.set(latest.version);
        this.stale.set({ latest, changed, loading: false });
      },
      error: (error: unknown) => {
        this.stale.update((s) => (s ? { ...s, loading: false } : s));
        this.banner.set(apiProblem(error).message);
      },
    });
  }

  /** Replaces the user's edits with the latest stored version. */
  protected useLatest(): void {
    const latest = this.stale()?.latest;
    if (!latest) return;
    this.form.setValue(studyFormValue(latest));
    this.stale.set(null);
  }
}
