import type { Data } from 'plotly.js-dist-min';
import type { SweepEnvelope } from '../api-types';
import type { PlotFigure } from './plot-renderer';
import { baseLayout, plotColours, tideScale } from './plot-style';
import type { SweepMatrix } from './sweep-matrix';

export interface CouplingMapInput {
  /** k over x–y (m). */
  k: SweepMatrix;
  /** η_max over the same grid (0 … 1). */
  eta: SweepMatrix;
  /** The envelope of this gap, if the result has one. */
  envelope: SweepEnvelope | null;
  /** The design offset, m. */
  nominal: { x: number; y: number };
  /** Keeps zoom and pan across redraws of the same map (the run id and gap). */
  uirevision: string;
}

const mm = (m: number) => m * 1000;

/**
 * The x–y coupling map: k as a heatmap with contour lines, the tolerance envelope's outline, its
 * worst point and the nominal point; millimetres on both axes at one scale.
 *
 * Trace order (the click handler and the specs rely on it): 0 heatmap of k (η_max in % as
 * customdata for the hover), 1 contour lines, 2 envelope outline (rings joined by gaps),
 * 3 worst point of the envelope, 4 nominal point.
 */
export function couplingMapFigure(input: CouplingMapInput): PlotFigure {
  const x = input.k.xs.map(mm);
  const y = input.k.ys.map(mm);
  const etaPercent = input.eta.values.map((row) => row.map((v) => v * 100));
  const data: Data[] = [
    {
      type: 'heatmap',
      name: 'k',
      x,
      y,
      z: input.k.values,
      customdata: etaPercent,
      colorscale: tideScale,
      zsmooth: false,
      colorbar: { title: { text: 'k' }, thickness: 14, outlinewidth: 0 },
      hovertemplate:
        'x %{x:.2f} mm<br>y %{y:.2f} mm<br>k %{z:.4f}<br>η_max %{customdata:.1f} %<extra></extra>',
      showlegend: false,
    },
    {
      type: 'contour',
      name: 'k contours',
      x,
      y,
      z: input.k.values,
      ncontours: 10,
      contours: {
        coloring: 'none',
        showlabels: true,
        labelfont: { size: 10, color: plotColours.contour },
      },
      line: { color: plotColours.contour, width: 1 },
      hoverinfo: 'skip',
      showlegend: false,
    },
    envelopeTrace(input.envelope),
    {
      type: 'scatter',
      mode: 'markers',
      name: 'Worst point in the envelope',
      x: input.envelope?.worst ? [mm(input.envelope.worst.x)] : [],
      y: input.envelope?.worst ? [mm(input.envelope.worst.y)] : [],
      marker: {
        symbol: 'diamond',
        size: 11,
        color: plotColours.envelope,
        line: { color: '#ffffff', width: 1.5 },
      },
      hovertemplate: 'Worst point<br>x %{x:.2f} mm<br>y %{y:.2f} mm<extra></extra>',
    },
    {
      type: 'scatter',
      mode: 'markers',
      name: 'Nominal pose',
      x: [mm(input.nominal.x)],
      y: [mm(input.nominal.y)],
      marker: {
        symbol: 'circle-cross-open',
        size: 13,
        color: plotColours.nominal,
        line: { width: 2 },
      },
      hovertemplate: 'Nominal pose<br>x %{x:.2f} mm<br>y %{y:.2f} mm<extra></extra>',
    },
  ];
  const span = (v: number[]): [number, number] => [v[0], v[v.length - 1]];
  return {
    data,
    layout: {
      ...baseLayout(input.uirevision),
      xaxis: { title: { text: 'x (mm)' }, range: span(x), constrain: 'domain', zeroline: false },
      yaxis: {
        title: { text: 'y (mm)' },
        range: span(y),
        scaleanchor: 'x',
        scaleratio: 1,
        constrain: 'domain',
        zeroline: false,
      },
    },
  };
}

/** Every ring of every polygon as one line (metres → mm), rings closed and split by nulls. */
function envelopeTrace(envelope: SweepEnvelope | null): Data {
  const x: (number | null)[] = [];
  const y: (number | null)[] = [];
  for (const polygon of envelope?.polygons ?? []) {
    for (const ring of polygon) {
      if (ring.length === 0) continue;
      if (x.length) {
        x.push(null);
        y.push(null);
      }
      const first = ring[0];
      const last = ring[ring.length - 1];
      const closed = first.x === last.x && first.y === last.y;
      for (const p of closed ? ring : [...ring, first]) {
        x.push(mm(p.x));
        y.push(mm(p.y));
      }
    }
  }
  const threshold = envelope ? envelope.thresholdK.toPrecision(3) : '';
  return {
    type: 'scatter',
    mode: 'lines',
    name: envelope ? `Tolerance envelope (k ≥ ${threshold})` : 'Tolerance envelope',
    x,
    y,
    line: { color: plotColours.envelope, width: 2.5 },
    connectgaps: false,
    hoverinfo: 'skip',
  };
}
