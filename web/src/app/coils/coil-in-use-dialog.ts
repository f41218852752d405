import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { RouterLink } from '@angular/router';

export interface CoilInUseDialogData {
  workspaceId: string;
  coilName: string;
  usedBy: { id: string; name: string }[];
}

/** Says why a coil cannot be deleted: the studies that use it as their Tx or Rx. */
@Component({
  selector: 'app-coil-in-use-dialog',
  imports: [MatButtonModule, MatDialogModule, RouterLink],
  template: `
    <h2 mat-dialog-title>“{{ data.coilName }}” is in use</h2>
    <mat-dialog-content>
      <p>
        These studies use it as their Tx or Rx coil. Choose another coil in each of them (or delete
        them) before deleting this one.
      </p>
      <ul data-testid="coil-used-by">
        @for (study of data.usedBy; track study.id) {
          <li>
            <a [routerLink]="['/w', data.workspaceId, 'studies', study.id]" mat-dialog-close>
              {{ study.name }}
            </a>
          </li>
        }
      </ul>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-flat-button type="button" mat-dialog-close>Close</button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilInUseDialog {
  protected readonly data = inject<CoilInUseDialogData>(MAT_DIALOG_DATA);
}
