import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Coil } from '../../../../physics/src/index';
import { formatQuantity } from '../units/format-quantity';
import { coilDrawing } from './coil-drawing-model';

/** The winding to scale: top view, and a side view for solenoids and stacked windings. */
@Component({
  selector: 'app-coil-drawing',
  template: `
    @if (drawing(); as d) {
      <figure class="views" data-testid="coil-drawing">
        <div class="view">
          <svg
            [attr.viewBox]="d.top.viewBox"
            role="img"
            [attr.aria-label]="'Top view of the winding, to scale; the bar is ' + d.top.bar.label"
            data-testid="coil-top-view"
          >
            @if (d.top.ferrite; as f) {
              <rect
                class="ferrite"
                [attr.x]="f.x"
                [attr.y]="f.y"
                [attr.width]="f.width"
                [attr.height]="f.height"
              />
            }
            <g class="winding" [attr.stroke-width]="d.top.stroke">
              @for (c of d.top.circles; track $index) {
                <circle [attr.cx]="c.cx" [attr.cy]="c.cy" [attr.r]="c.r" />
              }
              @for (p of d.top.paths; track $index) {
                <path [attr.d]="p" />
              }
            </g>
            <g class="bar">
              <line
                [attr.x1]="d.top.bar.x"
                [attr.y1]="d.top.bar.y"
                [attr.x2]="d.top.bar.x + d.top.bar.length"
                [attr.y2]="d.top.bar.y"
                [attr.stroke-width]="d.top.bar.fontSize / 5"
              />
              <text
                [attr.x]="d.top.bar.x"
                [attr.y]="d.top.bar.y + d.top.bar.fontSize * 1.3"
                [attr.font-size]="d.top.bar.fontSize"
              >
                {{ d.top.bar.label }}
              </text>
            </g>
          </svg>
          <figcaption>Top view (x–y)</figcaption>
        </div>
        @if (d.side; as side) {
          <div class="view">
            <svg
              [attr.viewBox]="side.viewBox"
              role="img"
              [attr.aria-label]="'Side view of the winding, to scale; the bar is ' + side.bar.label"
              data-testid="coil-side-view"
            >
              @if (side.ferrite; as f) {
                <rect
                  class="ferrite"
                  [attr.x]="f.x"
                  [attr.y]="f.y"
                  [attr.width]="f.width"
                  [attr.height]="f.height"
                />
              }
              <g class="winding" [attr.stroke-width]="side.stroke">
                @for (p of side.paths; track $index) {
                  <path [attr.d]="p" />
                }
              </g>
              <g class="sections">
                @for (c of side.sections; track $index) {
                  <circle [attr.cx]="c.cx" [attr.cy]="c.cy" [attr.r]="c.r" />
                }
              </g>
              <g class="bar">
                <line
                  [attr.x1]="side.bar.x"
                  [attr.y1]="side.bar.y"
                  [attr.x2]="side.bar.x + side.bar.length"
                  [attr.y2]="side.bar.y"
                  [attr.stroke-width]="side.bar.fontSize / 5"
                />
                <text
                  [attr.x]="side.bar.x"
                  [attr.y]="side.bar.y + side.bar.fontSize * 1.3"
                  [attr.font-size]="side.bar.fontSize"
                >
                  {{ side.bar.label }}
                </text>
              </g>
            </svg>
            <figcaption>Side view (x–z), conductor cross-sections</figcaption>
          </div>
        }
        @if (ferriteNote(); as note) {
          <p class="note" data-testid="coil-ferrite-note">{{ note }}</p>
        }
        @if (d.thinned) {
          <p class="note">Long paths are thinned for the drawing; the figures use every point.</p>
        }
      </figure>
    }
  `,
  styles: `
    .views {
      margin: 0;
      display: grid;
      gap: 12px;
    }
    .view {
      display: grid;
      gap: 4px;
    }
    svg {
      width: 100%;
      max-height: 320px;
      background: var(--mat-sys-surface-container-low);
      border-radius: var(--mat-sys-corner-medium);
    }
    .winding {
      fill: none;
      stroke: var(--mat-sys-tertiary);
      stroke-linejoin: round;
    }
    .sections circle {
      fill: var(--mat-sys-tertiary);
    }
    .ferrite {
      fill: var(--mat-sys-surface-container-highest);
      stroke: var(--mat-sys-outline);
      stroke-dasharray: 2 2;
      vector-effect: non-scaling-stroke;
    }
    .bar line {
      stroke: var(--mat-sys-on-surface);
    }
    .bar text {
      fill: var(--mat-sys-on-surface);
      font-family: inherit;
    }
    figcaption,
    .note {
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilDrawing {
  /** A coil the engine accepted; nothing is drawn while the form's spec is invalid. */
  readonly coil = input<Coil | null>(null);

  protected readonly drawing = computed(() => {
    const coil = this.coil();
    return coil ? coilDrawing(coil) : null;
  });

  protected readonly ferriteNote = computed(() => {
    const backing = this.coil()?.backing;
    if (!backing) return null;
    return (
      `Shaded: ferrite plate, μr ${backing.mur}, ${formatQuantity(backing.distance, 'm')} ` +
      'below the lowest layer. Modelled as an infinite plate by images, an approximation.'
    );
  });
}
