import { ChangeDetectionStrategy, Component } from '@angular/core';

/**
 * Couplet's mark: a small receiver coil over a larger transmitter coil, joined by field lines.
 * Colours come from the theme so the mark sits on the toolbar and on light cards alike.
 */
@Component({
  selector: 'app-logo-mark',
  template: `
    <svg viewBox="0 0 32 32" role="img" aria-label="Couplet">
      <ellipse class="rx" cx="16" cy="10.5" rx="7" ry="2.6" />
      <ellipse class="tx" cx="16" cy="21.5" rx="10" ry="3.4" />
      <path class="field" d="M11 13.5v4.5M16 13.8v4.4M21 13.5v4.5" />
    </svg>
  `,
  styles: `
    :host {
      display: inline-flex;
      width: var(--app-logo-size, 32px);
      height: var(--app-logo-size, 32px);
    }
    svg {
      width: 100%;
      height: 100%;
      fill: none;
      stroke-width: 2.2;
      stroke-linecap: round;
    }
    .rx {
      stroke: var(--app-logo-accent, var(--mat-sys-tertiary-fixed-dim));
    }
    .tx {
      stroke: currentColor;
    }
    .field {
      stroke: var(--app-logo-field, var(--mat-sys-primary-fixed-dim));
      stroke-width: 1.4;
      stroke-dasharray: 1.4 1.6;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LogoMark {}
