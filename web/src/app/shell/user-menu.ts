import {
  ChangeDetectionStrategy,
  Component,
  OnInit,
  computed,
  inject,
  input,
  output,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDividerModule } from '@angular/material/divider';
import { MatMenuModule } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import type { UserResponse } from '../api-types';
import { DevMailApi } from '../dev-mail/dev-mail-api';
import { Icon } from './icon';

/** The signed-in user, a way to the captured mail on development servers, and sign-out. */
@Component({
  selector: 'app-user-menu',
  imports: [Icon, MatButtonModule, MatDividerModule, MatMenuModule, RouterLink],
  template: `
    <button
      mat-button
      type="button"
      class="trigger"
      [matMenuTriggerFor]="menu"
      [attr.aria-label]="'Account of ' + user().displayName"
      data-testid="user-menu"
    >
      <span class="avatar" aria-hidden="true">{{ initials() }}</span>
      <span class="name">{{ user().displayName }}</span>
    </button>
    <mat-menu #menu="matMenu" xPosition="before">
      <div class="who" role="presentation">
        <strong>{{ user().displayName }}</strong>
        <span>{{ user().email }}</span>
      </div>
      <mat-divider />
      @if (devMail.available()) {
        <a mat-menu-item routerLink="/dev/mail">
          <app-icon name="inbox" class="menu-icon" /> Captured mail (development)
        </a>
      }
      <button mat-menu-item type="button" (click)="signOut.emit()" data-testid="sign-out">
        <app-icon name="sign-out" class="menu-icon" /> Sign out
      </button>
    </mat-menu>
  `,
  styles: `
    .avatar {
      display: inline-flex;
      align-items: center;
      justify-content: center;
      width: 28px;
      height: 28px;
      margin-right: 8px;
      border-radius: 50%;
      background: var(--mat-sys-tertiary-fixed-dim);
      color: var(--mat-sys-on-tertiary-fixed);
      font: var(--mat-sys-label-medium);
    }
    .name {
      max-width: 160px;
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    @media (max-width: 600px) {
      .name {
        display: none;
      }
    }
    .who {
      display: flex;
      flex-direction: column;
      padding: 8px 16px 12px;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .who strong {
      color: var(--mat-sys-on-surface);
    }
    .menu-icon {
      --app-icon-size: 18px;
      margin-right: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UserMenu implements OnInit {
  readonly user = input.required<UserResponse>();
  readonly signOut = output<void>();

  protected readonly devMail = inject(DevMailApi);
  protected readonly initials = computed(() =>
    this.user()
      .displayName.split(/\s+/)
      .filter(Boolean)
      .slice(0, 2)
      .map((word) => word.charAt(0).toUpperCase())
      .join(''),
  );

  ngOnInit(): void {
    this.devMail.probe();
  }
}
