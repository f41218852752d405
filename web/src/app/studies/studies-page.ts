import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import type { StudyResponse, StudySummaryResponse } from '../api-types';
import { Icon } from '../shell/icon';
import { StatusPanel } from '../shell/status-panel';
import { formatQuantity } from '../units/format-quantity';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { StudiesApi } from './studies-api';
import { StudyFormDialog, StudyFormDialogData } from './study-form-dialog';
import { thresholdText } from './threshold-text';

/** How a sweep run's status reads in the list. */
const runLabels: Record<string, string> = {
  queued: 'Queued',
  running: 'Running',
  succeeded: 'Done',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

/** The workspace's studies: one row per Tx–Rx pair under study, and a new one for editors. */
@Component({
  selector: 'app-studies-page',
  imports: [DatePipe, Icon, MatButtonModule, MatTableModule, RouterLink, StatusPanel],
  templateUrl: './studies-page.html',
  styleUrl: './studies-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudiesPage {
  private readonly api = inject(StudiesApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  protected readonly context = inject(WorkspaceContext);

  protected readonly studies = this.api.listResource(() => this.context.id());
  protected readonly rows = computed(() =>
    this.studies.hasValue() ? this.studies.value().items : [],
  );
  protected readonly problem = computed(() => {
    const error = this.studies.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly canEdit = computed(() => {
    const role = this.context.role();
    return role === 'owner' || role === 'editor';
  });
  protected readonly columns = ['name', 'pair', 'frequency', 'threshold', 'revisions', 'run'];

  protected readonly thresholdText = thresholdText;
  protected frequency(row: StudySummaryResponse): string {
    return formatQuantity(row.frequencyHz, 'Hz');
  }
  protected runLabel(status: string): string {
    return runLabels[status] ?? status;
  }

  protected create(): void {
    const workspaceId = this.context.id();
    if (!workspaceId) return;
    this.dialog
      .open<StudyFormDialog, StudyFormDialogData, StudyResponse>(StudyFormDialog, {
        data: { workspaceId },
        width: '760px',
        maxWidth: '96vw',
        autoFocus: 'first-tabbable',
      })
      .afterClosed()
      .subscribe((study) => {
        if (!study) return;
        this.studies.reload();
        void this.router.navigate(['/w', workspaceId, 'studies', study.id]);
      });
  }
}
