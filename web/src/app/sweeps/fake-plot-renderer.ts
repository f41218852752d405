import { Injectable, Provider } from '@angular/core';
import { PlotRenderer, type PlotFigure, type PlotPoint } from './plot-renderer';

/**
 * A PlotRenderer for specs (jsdom has no canvas and must not load plotly): it keeps the figures
 * it was given and lets a spec click a point. Provide it with `provideFakePlotRenderer()`.
 */
@Injectable()
export class FakePlotRenderer extends PlotRenderer {
  /** Every draw, oldest first. */
  readonly draws: { element: HTMLElement; figure: PlotFigure }[] = [];
  readonly savedPngs: string[] = [];
  readonly cleared: HTMLElement[] = [];
  private readonly handlers = new Map<HTMLElement, (point: PlotPoint) => void>();

  draw(element: HTMLElement, figure: PlotFigure): Promise<void> {
    this.draws.push({ element, figure });
    return Promise.resolve();
  }

  resize(): void {
    // Nothing is laid out in jsdom.
  }

  onClick(element: HTMLElement, handler: (point: PlotPoint) => void): void {
    this.handlers.set(element, handler);
  }

  savePng(_element: HTMLElement, filename: string): Promise<void> {
    this.savedPngs.push(filename);
    return Promise.resolve();
  }

  clear(element: HTMLElement): void {
    this.cleared.push(element);
  }

  /** The newest figure drawn into the element with this data-testid. */
  latest(testId: string): PlotFigure | undefined {
    for (let i = this.draws.length - 1; i >= 0; i--) {
      if (this.draws[i].element.getAttribute('data-testid') === testId) return this.draws[i].figure;
    }
    return undefined;
  }

  /** Draws into the element with this data-testid so far. */
  drawCount(testId: string): number {
    return this.draws.filter((d) => d.element.getAttribute('data-testid') === testId).length;
  }

  /** Clicks a point of the plot with this data-testid, as plotly would report it. */
  click(testId: string, point: PlotPoint): void {
    for (const [element, handler] of this.handlers) {
      if (element.getAttribute('data-testid') === testId) handler(point);
    }
  }
}

export function provideFakePlotRenderer(): Provider[] {
  return [FakePlotRenderer, { provide: PlotRenderer, useExisting: FakePlotRenderer }];
}
