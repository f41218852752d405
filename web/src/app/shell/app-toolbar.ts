import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatToolbarModule } from '@angular/material/toolbar';
import { NavigationEnd, Router, RouterLink } from '@angular/router';
import { filter, map } from 'rxjs';
import { AuthSession } from '../auth/auth-session';
import { LogoMark } from './logo-mark';
import { UserMenu } from './user-menu';
import { WorkspaceSwitcher } from './workspace-switcher';

@Component({
  selector: 'app-toolbar',
  imports: [LogoMark, MatButtonModule, MatToolbarModule, RouterLink, UserMenu, WorkspaceSwitcher],
  template: `
    <mat-toolbar class="app-toolbar">
      <a class="brand" routerLink="/" aria-label="Couplet home">
        <app-logo-mark class="mark" />
        <span class="wordmark">Couplet</span>
      </a>
      @if (session.user(); as user) {
        <app-workspace-switcher class="switcher" />
        <span class="spacer"></span>
        <app-user-menu [user]="user" (signOut)="signOut()" />
      } @else if (!onAuthPage()) {
        <span class="spacer"></span>
        <a mat-button routerLink="/sign-in">Sign in</a>
        <a mat-stroked-button routerLink="/sign-up">Create account</a>
      }
    </mat-toolbar>
  `,
  styles: `
    :host {
      display: block;
      position: sticky;
      top: 0;
      z-index: 10;
    }
    .app-toolbar {
      gap: 12px;
      box-shadow: var(--mat-sys-level2);
    }
    .switcher {
      min-width: 0;
    }
    .brand {
      flex: none;
      display: inline-flex;
      align-items: center;
      gap: 10px;
      color: inherit;
      text-decoration: none;
      margin-right: 12px;
    }
    .mark {
      --app-logo-size: 34px;
    }
    .wordmark {
      font: var(--mat-sys-title-large);
      font-weight: 600;
      letter-spacing: 0.02em;
    }
    .spacer {
      flex: 1;
    }
    @media (max-width: 600px) {
      .wordmark {
        display: none;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AppToolbar {
  protected readonly session = inject(AuthSession);
  private readonly router = inject(Router);

  /** The sign-in and sign-up pages offer their own way across; the toolbar need not repeat it. */
  protected readonly onAuthPage = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map((event) => /^\/(sign-in|sign-up)\b/.test(event.urlAfterRedirects)),
    ),
    { initialValue: false },
  );

  protected signOut(): void {
    this.session.signOut().subscribe(() => void this.router.navigate(['/sign-in']));
  }
}
