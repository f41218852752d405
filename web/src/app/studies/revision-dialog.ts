import { DatePipe, JsonPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { apiProblem } from '../api-problem';
import type { RevisionResponse, StudyCoil } from '../api-types';
import { StatusPanel } from '../shell/status-panel';
import { formatQuantity } from '../units/format-quantity';
import { StudiesApi } from './studies-api';
import { StudyInputsSummary } from './study-inputs-summary';

export interface RevisionDialogData {
  workspaceId: string;
  studyId: string;
  revisionId: string;
  number: number;
}

/** One frozen revision, read-only: its inputs, both coil snapshots and what results it holds. */
@Component({
  selector: 'app-revision-dialog',
  imports: [DatePipe, JsonPipe, MatButtonModule, MatDialogModule, StatusPanel, StudyInputsSummary],
  templateUrl: './revision-dialog.html',
  styleUrl: './revision-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RevisionDialog {
  private readonly api = inject(StudiesApi);
  protected readonly data = inject<RevisionDialogData>(MAT_DIALOG_DATA);

  protected readonly revision = signal<RevisionResponse | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly coils = computed(() => {
    const r = this.revision();
    return r
      ? [
          { side: 'Tx', coil: r.coilSnapshots.tx },
          { side: 'Rx', coil: r.coilSnapshots.rx },
        ]
      : [];
  });

  constructor() {
    this.load();
  }

  protected load(): void {
    this.problem.set(null);
    const { workspaceId, studyId, revisionId } = this.data;
    this.api.revision(workspaceId, studyId, revisionId).subscribe({
      next: (revision) => this.revision.set(revision),
      error: (error: unknown) => this.problem.set(apiProblem(error).message),
    });
  }

  protected figures(coil: StudyCoil): string {
    const f = coil.figures;
    const parts = [`L ${formatQuantity(f.L, 'H')}`, `R_dc ${formatQuantity(f.Rdc, 'Ω')}`];
    if (f.Rac !== null) parts.push(`R_ac ${formatQuantity(f.Rac, 'Ω')}`);
    if (f.Q !== null) parts.push(`Q ${f.Q.toPrecision(3)}`);
    return parts.join(' · ');
  }
}
