import { ChangeDetectionStrategy, Component } from '@angular/core';
import { Icon } from './icon';

/** The cautions every workspace shows: the work can hurt people, and the models have limits. */
@Component({
  selector: 'app-safety-notes',
  imports: [Icon],
  template: `
    <aside class="caution-panel" aria-labelledby="safety-notes-title" data-testid="safety-notes">
      <h2 class="caution-title" id="safety-notes-title">
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
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SafetyNotes {}
