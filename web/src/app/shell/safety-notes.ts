import { ChangeDetectionStrategy, Component } from '@angular/core';
import { Icon } from './icon';

/** The cautions every workspace shows: the work can hurt people, and the models have limits. */
@Component({
  selector: 'app-safety-notes',
  imports: [Icon],
  template: `
    <aside class="notes" aria-labelledby="safety-notes-title" data-testid="safety-notes">
      <h2 id="safety-notes-title">
        <app-icon name="shield" /> Before a result leaves this workspace
      </h2>
      <ul>
        <li>
          Resonant tanks build high voltages across coils and capacitors, even from a modest supply.
          Treat the compensation network as live.
        </li>
        <li>
          Compare stray fields with the public exposure reference levels that apply where the
          product is sold (ICNIRP guidelines in many places). Couplet is not a compliance test.
        </li>
        <li>Metal objects between the coils heat up. Plan for foreign-object detection.</li>
        <li>
          Filament models ignore ferrite saturation, eddy currents in nearby metal and the coil's
          self-resonance; ferrite is modelled as an infinite plate. Check against bench data.
        </li>
      </ul>
      <p class="defer">
        Local codes and licensed practice take precedence over anything shown here.
      </p>
    </aside>
  `,
  styles: `
    .notes {
      padding: 20px 24px;
      border-radius: var(--mat-sys-corner-large);
      border-left: 4px solid var(--mat-sys-tertiary);
      background: var(--mat-sys-surface-container);
      color: var(--mat-sys-on-surface);
    }
    h2 {
      display: flex;
      align-items: center;
      gap: 8px;
      font: var(--mat-sys-title-small);
      color: var(--mat-sys-tertiary);
    }
    ul {
      margin: 12px 0;
      padding-left: 20px;
      display: grid;
      gap: 6px;
    }
    .defer {
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SafetyNotes {}
