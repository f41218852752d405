import {
  ChangeDetectionStrategy,
  Component,
  WritableSignal,
  computed,
  inject,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { filter, switchMap } from 'rxjs';
import { apiProblem } from '../api-problem';
import type { InvitationResponse, MemberResponse } from '../api-types';
import { AuthSession } from '../auth/auth-session';
import { DevMailHint } from '../dev-mail/dev-mail-hint';
import { ConfirmDialog, ConfirmDialogData } from '../shell/confirm-dialog';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { InviteForm } from './invite-form';
import { MembersTable, RoleChange } from './members-table';
import { PendingInvitations } from './pending-invitations';
import { WorkspaceContext } from './workspace-context';
import { WorkspaceList } from './workspace-list';
import { WorkspacesApi } from './workspaces-api';

const lastOwnerMessage =
  'A workspace always keeps an owner. Make someone else owner first, then change this one.';

@Component({
  selector: 'app-members-page',
  imports: [
    DevMailHint,
    InviteForm,
    MatButtonModule,
    MembersTable,
    PendingInvitations,
    ProblemBanner,
    StatusPanel,
  ],
  templateUrl: './members-page.html',
  styleUrl: './members-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage {
  private readonly api = inject(WorkspacesApi);
  private readonly workspaceList = inject(WorkspaceList);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly router = inject(Router);
  protected readonly context = inject(WorkspaceContext);
  protected readonly session = inject(AuthSession);

  protected readonly members = this.api.membersResource(() => this.context.id());
  /** Only owners may list invitations; nobody else asks. */
  protected readonly invitations = this.api.invitationsResource(() =>
    this.context.isOwner() ? this.context.id() : undefined,
  );

  protected readonly banner = signal<string | null>(null);
  protected readonly busyMembers = signal<ReadonlySet<string>>(new Set());
  protected readonly busyInvitations = signal<ReadonlySet<string>>(new Set());

  protected readonly membersProblem = computed(() => {
    const error = this.members.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly invitationsProblem = computed(() => {
    const error = this.invitations.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly memberList = computed(() =>
    this.members.hasValue() ? this.members.value().items : [],
  );

  protected changeRole({ member, role }: RoleChange): void {
    const workspaceId = this.context.id();
    if (!workspaceId || role === member.role) return;
    this.banner.set(null);
    this.mark(this.busyMembers, member.userId, true);
    this.api.changeRole(workspaceId, member.userId, role).subscribe({
      next: () => {
        this.mark(this.busyMembers, member.userId, false);
        this.members.reload();
        if (member.userId === this.session.user()?.id) this.refreshOwnRole();
        this.snackBar.open(`${member.displayName} is now ${role}.`, undefined, { duration: 4000 });
      },
      error: (error: unknown) => {
        this.mark(this.busyMembers, member.userId, false);
        const problem = apiProblem(error);
        this.banner.set(problem.code === 'last_owner' ? lastOwnerMessage : problem.message);
        // Puts the select back to what the server holds.
        this.members.reload();
      },
    });
  }

  protected remove(member: MemberResponse): void {
    const workspaceId = this.context.id();
    if (!workspaceId) return;
    const self = member.userId === this.session.user()?.id;
    const data: ConfirmDialogData = self
      ? {
          title: 'Leave this workspace?',
          message: 'You will lose access until an owner invites you again.',
          confirm: 'Leave',
        }
      : {
          title: `Remove ${member.displayName}?`,
          message: `${member.email} loses access to this workspace. Their past work stays.`,
          confirm: 'Remove',
        };
    this.banner.set(null);
    this.dialog
      .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((yes) => yes === true),
        switchMap(() => {
          this.mark(this.busyMembers, member.userId, true);
          return this.api.removeMember(workspaceId, member.userId);
        }),
      )
      .subscribe({
        next: () => {
          this.mark(this.busyMembers, member.userId, false);
          if (self) {
            this.workspaceList.reload();
            void this.router.navigate(['/workspaces']);
            return;
          }
          this.members.reload();
          this.snackBar.open(`${member.displayName} was removed.`, undefined, { duration: 4000 });
        },
        error: (error: unknown) => {
          this.mark(this.busyMembers, member.userId, false);
          const problem = apiProblem(error);
          this.banner.set(problem.code === 'last_owner' ? lastOwnerMessage : problem.message);
        },
      });
  }

  protected invited(invitation: InvitationResponse): void {
    this.invitations.reload();
    this.snackBar.open(`Invitation sent to ${invitation.email}.`, undefined, { duration: 4000 });
  }

  protected revoke(invitation: InvitationResponse): void {
    const workspaceId = this.context.id();
    if (!workspaceId) return;
    this.banner.set(null);
    this.mark(this.busyInvitations, invitation.id, true);
    this.api.revokeInvitation(workspaceId, invitation.id).subscribe({
      next: () => {
        this.mark(this.busyInvitations, invitation.id, false);
        this.invitations.reload();
        this.snackBar.open(`The invitation to ${invitation.email} was revoked.`, undefined, {
          duration: 4000,
        });
      },
      error: (error: unknown) => {
        this.mark(this.busyInvitations, invitation.id, false);
        this.banner.set(apiProblem(error).message);
        this.invitations.reload();
      },
    });
  }

  private refreshOwnRole(): void {
    this.context.workspace.reload();
    this.workspaceList.reload();
  }

  private mark(set: WritableSignal<ReadonlySet<string>>, id: string, busy: boolean): void {
    set.update((current) => {
      const next = new Set(current);
      if (busy) next.add(id);
      else next.delete(id);
      return next;
    });
  }
}
