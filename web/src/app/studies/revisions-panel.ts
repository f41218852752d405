import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { apiProblem } from '../api-problem';
import type { RevisionSummaryResponse, StudyResponse } from '../api-types';
import { StatusPanel } from '../shell/status-panel';
import { RevisionDialog, RevisionDialogData } from './revision-dialog';
import {
  SaveRevisionDialog,
  SaveRevisionDialogData,
  SaveRevisionResult,
} from './save-revision-dialog';
import { StudiesApi } from './studies-api';

/** A study's revisions, newest first, with "Save revision" for editors. */
@Component({
  selector: 'app-revisions-panel',
  imports: [DatePipe, MatButtonModule, StatusPanel],
  templateUrl: './revisions-panel.html',
  styleUrl: './revisions-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RevisionsPanel {
  readonly workspaceId = input.required<string>();
  readonly study = input.required<StudyResponse>();
  readonly canEdit = input(false);
  /** The study must be reloaded before a revision can be saved (it changed meanwhile). */
  readonly reloadStudy = output<void>();

  private readonly api = inject(StudiesApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly revisions = this.api.revisionsResource(() => ({
    workspaceId: this.workspaceId(),
    studyId: this.study().id,
  }));
  protected readonly items = computed(() =>
    this.revisions.hasValue()
      ? [...this.revisions.value().items].sort((a, b) => b.number - a.number)
      : [],
  );
  protected readonly problem = computed(() => {
    const error = this.revisions.error();
    return error ? apiProblem(error).message : null;
  });
  /** A summary typed before a reload, offered again. */
  private readonly draft = signal('');

  protected save(): void {
    const study = this.study();
    this.dialog
      .open<SaveRevisionDialog, SaveRevisionDialogData, SaveRevisionResult>(SaveRevisionDialog, {
        data: {
          workspaceId: this.workspaceId(),
          studyId: study.id,
          studyVersion: study.version,
          summary: this.draft(),
        },
        width: '560px',
        maxWidth: '96vw',
      })
      .afterClosed()
      .subscribe((result) => {
        if (!result) return;
        if ('reload' in result) {
          this.draft.set(result.summary);
          this.reloadStudy.emit();
          return;
        }
        this.draft.set('');
        this.revisions.reload();
        this.snackBar.open(`Revision ${result.saved.number} saved.`, undefined, {
          duration: 4000,
        });
      });
  }

  protected open(revision: RevisionSummaryResponse): void {
    this.dialog.open<RevisionDialog, RevisionDialogData>(RevisionDialog, {
      data: {
        workspaceId: this.workspaceId(),
        studyId: this.study().id,
        revisionId: revision.id,
        number: revision.number,
      },
      width: '760px',
      maxWidth: '96vw',
    });
  }

  /** A revision computed from other inputs than the study's current ones. */
  protected outdated(revision: RevisionSummaryResponse): boolean {
    return revision.inputsHash !== this.study().inputsHash;
  }
}
