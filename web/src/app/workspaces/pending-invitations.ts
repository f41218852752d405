import { DatePipe, TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { InvitationResponse } from '../api-types';
import { Icon } from '../shell/icon';

/** Whether an invitation can still be accepted at `now`. */
export function isPending(invitation: InvitationResponse, now = Date.now()): boolean {
  return !invitation.acceptedAt && !invitation.revokedAt && Date.parse(invitation.expiresAt) > now;
}

/** The owner's list of invitations not yet accepted, each with a revoke button. */
@Component({
  selector: 'app-pending-invitations',
  imports: [DatePipe, Icon, MatButtonModule, TitleCasePipe],
  template: `
    @if (pending().length === 0) {
      <p class="muted none" data-testid="no-pending-invitations">No invitations are waiting.</p>
    } @else {
      <ul class="list">
        @for (invitation of pending(); track invitation.id) {
          <li data-testid="pending-invitation">
            <app-icon name="mail" class="symbol" />
            <div class="what">
              <span class="email">{{ invitation.email }}</span>
              <span class="muted">
                <span>{{ invitation.role | titlecase }}</span>
                <span> · sent by {{ invitation.invitedBy.displayName }}</span>
                <span> · open until {{ invitation.expiresAt | date: 'mediumDate' }}</span>
              </span>
            </div>
            <button
              mat-stroked-button
              type="button"
              (click)="revoke.emit(invitation)"
              [disabled]="busy().has(invitation.id)"
              [attr.aria-label]="'Revoke the invitation to ' + invitation.email"
              data-testid="revoke-invitation"
            >
              Revoke
            </button>
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .none {
      margin: 0;
    }
    .list {
      list-style: none;
      margin: 0;
      padding: 0;
    }
    li {
      display: flex;
      align-items: center;
      gap: 12px;
      padding: 10px 0;
      border-top: 1px solid var(--mat-sys-outline-variant);
    }
    li:first-child {
      border-top: none;
    }
    .symbol {
      color: var(--mat-sys-tertiary);
    }
    .what {
      flex: 1;
      display: flex;
      flex-direction: column;
      min-width: 0;
    }
    .email {
      font: var(--mat-sys-title-small);
      overflow-wrap: anywhere;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PendingInvitations {
  readonly invitations = input.required<InvitationResponse[]>();
  readonly busy = input<ReadonlySet<string>>(new Set());
  readonly revoke = output<InvitationResponse>();

  protected readonly pending = computed(() => this.invitations().filter((i) => isPending(i)));
}
