import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  afterNextRender,
  effect,
  inject,
  input,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import type { StudyPose } from '../api-types';
import { formatQuantity } from '../units/format-quantity';
import type { PairDrawing } from './pair-geometry';
import type { PairScene, SceneColours, ViewPreset } from './pair-scene';

/** Whether this browser can draw WebGL (jsdom and some locked-down browsers cannot). */
export function webglAvailable(): boolean {
  if (typeof WebGLRenderingContext === 'undefined') return false;
  try {
    const canvas = document.createElement('canvas');
    return !!(canvas.getContext('webgl2') ?? canvas.getContext('webgl'));
  } catch {
    return false;
  }
}

/**
 * The pair in 3D, to scale, with orbit, zoom and pan and three view presets. three.js loads
 * with the first render (its own chunk) and only where WebGL works; elsewhere the container
 * says so and the rest of the workbench works as before.
 */
@Component({
  selector: 'app-pair-view',
  imports: [MatButtonToggleModule],
  template: `
    <div class="frame">
      <div class="canvas" #canvas data-testid="pair-view" [attr.data-state]="state()"></div>
      @switch (state()) {
        @case ('unsupported') {
          <p class="overlay" data-testid="pair-view-unsupported">
            The 3D view needs WebGL, which this browser does not offer. The figures beside it are
            computed all the same.
          </p>
        }
        @case ('failed') {
          <p class="overlay">The 3D view could not start: {{ failure() }}</p>
        }
        @case ('loading') {
          <p class="overlay">Drawing the pair…</p>
        }
      }
      <div class="toolbar">
        <mat-button-toggle-group
          hideSingleSelectionIndicator
          [value]="preset()"
          (change)="view($event.value)"
          aria-label="View"
        >
          <mat-button-toggle value="top" data-testid="view-top">Top</mat-button-toggle>
          <mat-button-toggle value="side" data-testid="view-side">Side</mat-button-toggle>
          <mat-button-toggle value="iso" data-testid="view-iso">Iso</mat-button-toggle>
        </mat-button-toggle-group>
      </div>
      <div class="legend" aria-hidden="true">
        <span class="key tx"></span>Tx <span class="key rx"></span>Rx
        @if (hasFerrite()) {
          <span class="key ferrite"></span>ferrite
        }
        @if (gridStep(); as step) {
          <span class="grid-note">grid {{ step }}</span>
        }
      </div>
    </div>
  `,
  styleUrl: './pair-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PairView {
  readonly drawing = input<PairDrawing | null>(null);
  readonly pose = input.required<StudyPose>();

  private readonly canvas = viewChild.required<ElementRef<HTMLElement>>('canvas');
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly scene = signal<PairScene | null>(null);
  protected readonly state = signal<'loading' | 'ready' | 'unsupported' | 'failed'>('loading');
  protected readonly failure = signal('');
  protected readonly preset = signal<ViewPreset>('iso');
  protected readonly hasFerrite = signal(false);
  protected readonly gridStep = signal<string | null>(null);

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      if (!webglAvailable()) {
        this.state.set('unsupported');
        return;
      }
      import('./pair-scene')
        .then(({ PairScene }) => {
          if (destroyRef.destroyed) return;
          const scene = new PairScene(this.canvas().nativeElement, this.colours());
          destroyRef.onDestroy(() => scene.dispose());
          this.scene.set(scene);
        })
        .catch((error: unknown) => {
          this.failure.set(error instanceof Error ? error.message : String(error));
          this.state.set('failed');
        });
    });
    effect(() => {
      const scene = this.scene();
      const drawing = this.drawing();
      if (!scene || !drawing) return;
      scene.setPair(drawing);
      // The pose has its own effect: a slider move must not rebuild the coils.
      scene.setPose(untracked(this.pose));
      this.hasFerrite.set(!!(drawing.tx.slab ?? drawing.rx.slab));
      this.gridStep.set(formatQuantity(drawing.gridStep, 'm', { digits: 3, trim: true }));
      this.state.set('ready');
    });
    effect(() => {
      const pose = this.pose();
      this.scene()?.setPose(pose);
    });
  }

  protected view(preset: ViewPreset): void {
    this.preset.set(preset);
    this.scene()?.setView(preset);
  }

  /**
   * Tx in the theme's copper, Rx in its teal: each token resolved by the browser on a probe
   * element (so `light-dark()` and the like arrive as plain rgb()).
   */
  private colours(): SceneColours {
    const probe = document.createElement('span');
    this.host.nativeElement.appendChild(probe);
    const token = (name: string) => {
      probe.style.color = `var(${name})`;
      return getComputedStyle(probe).color;
    };
    const colours = {
      tx: token('--mat-sys-tertiary'),
      rx: token('--mat-sys-primary'),
      ferrite: token('--mat-sys-inverse-surface'),
      grid: token('--mat-sys-outline-variant'),
    };
    probe.remove();
    return colours;
  }
}
