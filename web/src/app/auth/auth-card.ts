import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { LogoMark } from '../shell/logo-mark';

/** The centred card that frames every signed-out page. */
@Component({
  selector: 'app-auth-card',
  imports: [LogoMark],
  template: `
    <main class="frame">
      <section class="card" [attr.aria-labelledby]="'auth-card-title'">
        <header>
          <app-logo-mark class="mark" />
          <h1 id="auth-card-title">{{ heading() }}</h1>
          @if (lede()) {
            <p class="lede">{{ lede() }}</p>
          }
        </header>
        <ng-content />
      </section>
      <footer class="below">
        <ng-content select="[below]" />
      </footer>
    </main>
  `,
  styles: `
    .frame {
      min-height: calc(100vh - 64px);
      box-sizing: border-box;
      display: flex;
      flex-direction: column;
      align-items: center;
      justify-content: flex-start;
      padding: 48px 16px;
      background:
        radial-gradient(
          ellipse 60% 40% at 50% 0%,
          color-mix(in srgb, var(--mat-sys-primary-container) 70%, transparent),
          transparent 70%
        ),
        var(--mat-sys-surface-container-lowest);
    }
    .card {
      width: 100%;
      max-width: 420px;
      box-sizing: border-box;
      padding: 32px 32px 24px;
      background: var(--mat-sys-surface);
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-extra-large);
      box-shadow: var(--mat-sys-level1);
    }
    header {
      display: flex;
      flex-direction: column;
      align-items: center;
      text-align: center;
      margin-bottom: 24px;
    }
    .mark {
      --app-logo-size: 48px;
      --app-logo-accent: var(--mat-sys-tertiary);
      --app-logo-field: var(--mat-sys-primary);
      color: var(--mat-sys-primary);
      margin-bottom: 12px;
    }
    h1 {
      font: var(--mat-sys-headline-small);
      color: var(--mat-sys-on-surface);
    }
    .lede {
      margin: 8px 0 0;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .below {
      margin-top: 16px;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
      text-align: center;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuthCard {
  readonly heading = input.required<string>();
  readonly lede = input<string>('');
}
