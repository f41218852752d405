import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  afterNextRender,
  effect,
  inject,
  input,
  output,
  signal,
  viewChild,
} from '@angular/core';
import { PlotRenderer, type PlotFigure, type PlotPoint } from './plot-renderer';

/**
 * One plot, drawn by the PlotRenderer: redrawn only when its figure changes (an update keeps
 * zoom), resized when its container changes size, freed when it leaves the page.
 */
@Component({
  selector: 'app-sweep-plot',
  template: `
    <div #plot class="plot" [attr.data-testid]="testId()" [attr.aria-label]="label()" role="img">
      @if (failed()) {
        <p class="failed">The plot could not be drawn. Reload the page to try again.</p>
      }
    </div>
  `,
  styles: `
    :host {
      display: block;
    }
    .plot {
      width: 100%;
      height: var(--app-plot-height, 420px);
    }
    .failed {
      margin: 0;
      padding: 24px;
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepPlot {
  private readonly renderer = inject(PlotRenderer);
  private readonly host = viewChild.required<ElementRef<HTMLElement>>('plot');

  readonly figure = input.required<PlotFigure>();
  readonly testId = input<string | null>(null);
  /** What the plot shows, for screen readers (the numbers are beside it in text). */
  readonly label = input('');
  readonly pointClicked = output<PlotPoint>();

  protected readonly failed = signal(false);

  constructor() {
    const destroyRef = inject(DestroyRef);
    effect(() => {
      const element = this.host().nativeElement;
      const figure = this.figure();
      this.renderer.draw(element, figure).then(
        () => this.failed.set(false),
        () => this.failed.set(true),
      );
    });
    afterNextRender(() => {
      const element = this.host().nativeElement;
      this.renderer.onClick(element, (point) => this.pointClicked.emit(point));
      // jsdom has no ResizeObserver; there is nothing to resize there either.
      if (typeof ResizeObserver === 'undefined') return;
      let frame = 0;
      const observer = new ResizeObserver(() => {
        cancelAnimationFrame(frame);
        frame = requestAnimationFrame(() => this.renderer.resize(element));
      });
      observer.observe(element);
      destroyRef.onDestroy(() => {
        cancelAnimationFrame(frame);
        observer.disconnect();
      });
    });
    destroyRef.onDestroy(() => this.renderer.clear(this.host().nativeElement));
  }

  /** Saves what is on screen as a PNG. */
  savePng(filename: string): Promise<void> {
    return this.renderer.savePng(this.host().nativeElement, filename);
  }
}
