import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { apiProblem } from '../api-problem';
import type { RevisionSummaryResponse } from '../api-types';
import { ProblemBanner } from '../shell/problem-banner';
import { StudiesApi } from './studies-api';

export interface SaveRevisionDialogData {
  workspaceId: string;
  studyId: string;
  /** The study version on screen: the revision freezes exactly what the author looked at. */
  studyVersion: number;
  /** A summary typed before, kept across a reload. */
  summary: string;
}

/** How the dialog ended: saved, or the study must be reloaded first (the summary is kept). */
export type SaveRevisionResult =
  { saved: RevisionSummaryResponse } | { reload: true; summary: string };

/** Freezes the study as a numbered revision, with a one-paragraph summary of what changed. */
@Component({
  selector: 'app-save-revision-dialog',
  imports: [
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
  ],
  template: `
    <h2 mat-dialog-title>Save a revision</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        <p class="lede">
          A revision freezes the study's inputs, both coils as they are now and the current sweep
          results, for review. Later edits do not change it.
        </p>
        @if (stale()) {
          <div class="stale" role="alert" data-testid="revision-stale">
            <p>
              The study was changed by someone else after you opened it, so this would freeze
              something you have not seen. Reload the study, check it, then save the revision: your
              summary is kept.
            </p>
            <button mat-flat-button type="button" (click)="reload()" data-testid="revision-reload">
              Reload the study
            </button>
          </div>
        }
        <app-problem-banner [message]="banner()" />
        <mat-form-field appearance="outline" class="wide" subscriptSizing="dynamic">
          <mat-label>Summary</mat-label>
          <textarea
            matInput
            rows="3"
            formControlName="summary"
            data-testid="revision-summary"
          ></textarea>
          <mat-hint
            >What changed and why, for the reviewers (optional, up to 500 characters)</mat-hint
          >
          <mat-error>Summary: at most 500 characters.</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button
          mat-flat-button
          type="submit"
          [disabled]="saving() || stale()"
          data-testid="revision-save"
        >
          {{ saving() ? 'Saving…' : 'Save revision' }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .content {
      display: flex;
      flex-direction: column;
      gap: 12px;
      max-width: 560px;
    }
    .lede {
      margin: 0;
      color: var(--mat-sys-on-surface-variant);
    }
    .wide {
      width: 100%;
    }
    .stale {
      padding: 12px 16px;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .stale p {
      margin: 0 0 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SaveRevisionDialog {
  private readonly api = inject(StudiesApi);
  private readonly ref = inject<MatDialogRef<SaveRevisionDialog, SaveRevisionResult>>(MatDialogRef);
  private readonly data = inject<SaveRevisionDialogData>(MAT_DIALOG_DATA);

  protected readonly form = inject(NonNullableFormBuilder).group({
    summary: [this.data.summary, [Validators.maxLength(500)]],
  });
  private readonly summary = this.form.controls.summary;
  protected readonly saving = signal(false);
  protected readonly stale = signal(false);
  protected readonly banner = signal<string | null>(null);

  protected save(): void {
    this.banner.set(null);
    if (this.summary.invalid) {
      this.summary.markAsTouched();
      return;
    }
    this.saving.set(true);
    const request = { summary: this.summary.value.trim(), studyVersion: this.data.studyVersion };
    this.api.createRevision(this.data.workspaceId, this.data.studyId, request).subscribe({
      next: (saved) => {
        this.saving.set(false);
        this.ref.close({ saved });
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const problem = apiProblem(error);
        if (problem.code === 'stale_version') this.stale.set(true);
        else this.banner.set(problem.message);
      },
    });
  }

  protected reload(): void {
    this.ref.close({ reload: true, summary: this.summary.value });
  }
}
