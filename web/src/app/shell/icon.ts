import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

/** A circle as a path, so every icon is a plain list of stroked paths. */
function ring(cx: number, cy: number, r: number): string {
  return `M${cx - r} ${cy}a${r} ${r} 0 1 0 ${2 * r} 0a${r} ${r} 0 1 0 ${-2 * r} 0`;
}

// Couplet's own line icons on a 24-unit grid, stroked with the text colour. Drawn here rather than
// loaded from an icon font: the app ships no remote assets.
const iconPaths = {
  plus: ['M12 5v14', 'M5 12h14'],
  'chevron-down': ['M7 10l5 5 5-5'],
  check: ['M5 12.5l4.5 4.5L19 7.5'],
  close: ['M6.5 6.5l11 11', 'M17.5 6.5l-11 11'],
  alert: ['M12 3.5l9.5 16.5h-19z', 'M12 10v4.5', 'M12 17.2v.3'],
  info: [ring(12, 12, 9), 'M12 11v5.5', 'M12 7.6v.3'],
  mail: ['M3.5 5.5h17v13h-17z', 'M3.5 7l8.5 6 8.5-6'],
  user: [ring(12, 8, 3.8), 'M4.5 20c1.3-3.8 4.2-5.8 7.5-5.8s6.2 2 7.5 5.8'],
  people: [
    ring(9, 8.5, 3.3),
    'M3 19.5c1-3.3 3.3-5 6-5s5 1.7 6 5',
    'M15.2 5.6a3.2 3.2 0 0 1 0 6',
    'M17 14.8c2 .6 3.3 2.2 4 4.7',
  ],
  'sign-out': ['M14 4.5h5v15h-5', 'M9.5 8l-4 4 4 4', 'M5.5 12h10'],
  trash: ['M4.5 7h15', 'M9.5 7V4.5h5V7', 'M6.5 7l1 12.5h9l1-12.5', 'M10.5 10.5v6', 'M13.5 10.5v6'],
  home: ['M4 11l8-6.5 8 6.5', 'M6 9.5v10h4.5v-5.5h3v5.5H18v-10'],
  // A planar spiral of half-turns with growing radius, as a wound Tx pad looks from above.
  coil: [
    'M10.5 12.75a1.5 1.5 0 0 1 3 0a3 3 0 0 1-6 0' +
      'a4.5 4.5 0 0 1 9 0a6 6 0 0 1-12 0a7.5 7.5 0 0 1 15 0',
  ],
  study: ['M4 4v16h16', 'M7.5 15l3.5-4.5 3 2.5 4.5-6'],
  compare: ['M8 4v16', 'M16 4v16', 'M4.5 8.5h7', 'M12.5 15.5h7'],
  review: ['M4 5h16v11H9.5L5 19.5V16H4z', 'M8 9.5h8', 'M8 12.5h5'],
  settings: ['M4 7h9', 'M17 7h3', ring(15, 7, 2), 'M4 17h3', 'M11 17h9', ring(9, 17, 2)],
  clock: [ring(12, 12, 9), 'M12 7v5l3.5 2'],
  ban: [ring(12, 12, 9), 'M5.6 5.6l12.8 12.8'],
  refresh: ['M19.5 12a7.5 7.5 0 1 1-2.2-5.3', 'M19.5 4.5v4.5H15'],
  eye: ['M2.5 12S6 6 12 6s9.5 6 9.5 6-3.5 6-9.5 6-9.5-6-9.5-6z', ring(12, 12, 2.8)],
  'eye-off': ['M2.5 12S6 6 12 6s9.5 6 9.5 6-3.5 6-9.5 6-9.5-6-9.5-6z', 'M4 4l16 16'],
  send: ['M4 12l16-7.5-5.5 15-3-6.5z', 'M11.5 13l8.5-8.5'],
  shield: ['M12 3.5l7.5 3v5.5c0 4.5-3.2 7.5-7.5 8.5-4.3-1-7.5-4-7.5-8.5V6.5z', 'M9 12l2 2 4-4'],
  inbox: ['M3.5 13.5l2.5-8h12l2.5 8v5h-17z', 'M3.5 13.5h5l1 2h5l1-2h5'],
  lock: ['M6 10.5h12v9H6z', 'M8.5 10.5V8a3.5 3.5 0 0 1 7 0v2.5'],
  'arrow-right': ['M5 12h14', 'M13.5 6.5L19 12l-5.5 5.5'],
} satisfies Record<string, string[]>;

export type IconName = keyof typeof iconPaths;

@Component({
  selector: 'app-icon',
  template: `
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false">
      @for (d of paths(); track $index) {
        <path [attr.d]="d" />
      }
    </svg>
  `,
  styles: `
    :host {
      display: inline-flex;
      flex: none;
      width: var(--app-icon-size, 22px);
      height: var(--app-icon-size, 22px);
      vertical-align: middle;
    }
    svg {
      width: 100%;
      height: 100%;
      fill: none;
      stroke: currentColor;
      stroke-width: 1.8;
      stroke-linecap: round;
      stroke-linejoin: round;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Icon {
  readonly name = input.required<IconName>();
  protected readonly paths = computed(() => iconPaths[this.name()]);
}
