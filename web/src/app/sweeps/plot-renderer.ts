import { Injectable } from '@angular/core';
import type { Config, Data, Layout } from 'plotly.js-dist-min';

/** What a plot shows: plotly's traces and layout, built by pure functions. */
export interface PlotFigure {
  data: Data[];
  layout: Partial<Layout>;
}

/** A clicked sample, in the plot's data coordinates (mm on the maps). */
export interface PlotPoint {
  x: number;
  y: number;
  /** Which trace was clicked (0 is the map's heatmap). */
  trace: number;
}

/**
 * Draws figures into elements. An injectable seam: the app draws with plotly (loaded on demand,
 * so its 4.8 MB stay out of the first page), specs and jsdom use a fake that records the figures.
 */
@Injectable({ providedIn: 'root', useFactory: () => new PlotlyRenderer() })
export abstract class PlotRenderer {
  /** Draws or updates the figure in the element (an update keeps zoom and pan). */
  abstract draw(element: HTMLElement, figure: PlotFigure): Promise<void>;
  /** Follows the element's size after its container changed. */
  abstract resize(element: HTMLElement): void;
  /** Calls `handler` for each click on a data point, from the next draw on. */
  abstract onClick(element: HTMLElement, handler: (point: PlotPoint) => void): void;
  /** Saves the plot as a PNG file. */
  abstract savePng(element: HTMLElement, filename: string): Promise<void>;
  /** Frees what the plot holds (listeners, WebGL contexts). */
  abstract clear(element: HTMLElement): void;
}

type PlotlyModule = typeof import('plotly.js-dist-min');
type PlotlyApi = PlotlyModule['default'];

/** The mode-bar buttons the maps keep: zoom, pan, reset. Export is the map's own menu. */
const config: Partial<Config> = {
  displaylogo: false,
  responsive: false,
  modeBarButtonsToRemove: ['toImage', 'select2d', 'lasso2d', 'autoScale2d'],
};

/** plotly.js, imported the first time a plot is drawn. */
export class PlotlyRenderer extends PlotRenderer {
  private plotly: Promise<PlotlyApi> | null = null;
  private readonly drawn = new WeakSet<HTMLElement>();
  private readonly clickHandlers = new WeakMap<HTMLElement, (point: PlotPoint) => void>();

  async draw(element: HTMLElement, figure: PlotFigure): Promise<void> {
    const plotly = await this.load();
    await plotly.react(element, figure.data, figure.layout, config);
    if (!this.drawn.has(element)) {
      this.drawn.add(element);
      const graph = element as unknown as import('plotly.js-dist-min').PlotlyHTMLElement;
      graph.on('plotly_click', (event) => {
        const point = event.points[0];
        const handler = this.clickHandlers.get(element);
        if (!point || !handler || typeof point.x !== 'number' || typeof point.y !== 'number') {
          return;
        }
        handler({ x: point.x, y: point.y, trace: point.curveNumber });
      });
    }
  }

  resize(element: HTMLElement): void {
    if (!this.drawn.has(element)) return;
    void this.load().then((plotly) => plotly.Plots.resize(element));
  }

  onClick(element: HTMLElement, handler: (point: PlotPoint) => void): void {
    this.clickHandlers.set(element, handler);
  }

  async savePng(element: HTMLElement, filename: string): Promise<void> {
    const plotly = await this.load();
    const { width, height } = element.getBoundingClientRect();
    await plotly.downloadImage(element, {
      format: 'png',
      filename: filename.replace(/\.png$/, ''),
      // Twice the screen size: sharp enough for a drawing or a slide.
      width: Math.round(width) || 800,
      height: Math.round(height) || 600,
      scale: 2,
    });
  }

  clear(element: HTMLElement): void {
    if (!this.drawn.has(element)) return;
    this.drawn.delete(element);
    void this.load().then((plotly) => plotly.purge(element));
  }

  private load(): Promise<PlotlyApi> {
    this.plotly ??= import('plotly.js-dist-min').then(
      // A CommonJS bundle: its namespace holds the API as `default` (or is the API itself).
      (module) => ((module as { default?: PlotlyApi }).default ?? module) as PlotlyApi,
    );
    return this.plotly;
  }
}
