import { HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Observable, catchError, filter, map, of, switchMap } from 'rxjs';
import { apiProblem } from '../api-problem';
import type { CoilResponse, ProblemResponse } from '../api-types';
import { ConfirmDialog, type ConfirmDialogData } from '../shell/confirm-dialog';
import { CoilInUseDialog, type CoilInUseDialogData } from './coil-in-use-dialog';
import { CoilsApi } from './coils-api';

/** How a delete ended: done, refused (the dialog said why), or cancelled by the user. */
export type DeleteOutcome = 'deleted' | 'in-use' | 'cancelled' | 'failed';

/**
 * The row actions the library table and the editor share: delete after a confirmation (a coil in
 * use lists its studies instead) and duplicate. Messages go to a snack bar or a dialog.
 */
@Injectable({ providedIn: 'root' })
export class CoilActions {
  private readonly api = inject(CoilsApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  /** Asks, then deletes; a 409 `in_use` opens a dialog that names the studies. */
  delete(coil: Pick<CoilResponse, 'id' | 'workspaceId' | 'name' | 'version'>) {
    const data: ConfirmDialogData = {
      title: `Delete “${coil.name}”?`,
      message:
        'The coil leaves the library for everyone in this workspace. Studies that use it keep ' +
        'you from deleting it.',
      confirm: 'Delete',
    };
    return this.dialog
      .open(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        switchMap((yes): Observable<DeleteOutcome> => {
          if (!yes) return of('cancelled');
          return this.api.remove(coil.workspaceId, coil.id, coil.version).pipe(
            map((): DeleteOutcome => {
              this.snackBar.open(`Deleted “${coil.name}”.`, 'Dismiss', { duration: 4000 });
              return 'deleted';
            }),
            catchError((error: unknown) => of(this.deleteFailed(coil, error))),
          );
        }),
      );
  }

  /** Makes a copy named by the server ("… (copy)"); emits the copy, or nothing on failure. */
  duplicate(coil: Pick<CoilResponse, 'id' | 'workspaceId' | 'name'>): Observable<CoilResponse> {
    return this.api.duplicate(coil.workspaceId, coil.id).pipe(
      map((copy) => {
        this.snackBar.open(`Made “${copy.name}”.`, 'Dismiss', { duration: 4000 });
        return copy;
      }),
      catchError((error: unknown) => {
        this.snackBar.open(`Could not duplicate: ${apiProblem(error).message}`, 'Dismiss');
        return of(null);
      }),
      filter((copy): copy is CoilResponse => copy !== null),
    );
  }

  private deleteFailed(coil: Pick<CoilResponse, 'workspaceId' | 'name'>, error: unknown) {
    const problem = apiProblem(error);
    const body =
      error instanceof HttpErrorResponse ? (error.error as Partial<ProblemResponse>) : null;
    if (problem.code === 'in_use' && body?.usedBy?.length) {
      const data: CoilInUseDialogData = {
        workspaceId: coil.workspaceId,
        coilName: coil.name,
        usedBy: body.usedBy,
      };
      this.dialog.open(CoilInUseDialog, { data });
      return 'in-use' as const;
    }
    const message =
      problem.code === 'stale_version'
        ? 'Someone changed this coil since you opened it. Reload, then delete again.'
        : problem.message;
    this.snackBar.open(`Could not delete “${coil.name}”: ${message}`, 'Dismiss');
    return 'failed' as const;
  }
}
