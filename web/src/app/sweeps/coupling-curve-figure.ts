import type { Data, Shape } from 'plotly.js-dist-min';
import type { Threshold } from '../api-types';
import type { PlotFigure } from './plot-renderer';
import { baseLayout, plotColours } from './plot-style';

export interface CouplingCurveInput {
  /** Axis values in display units (mm for the gap, degrees for tilts). */
  at: number[];
  k: number[];
  /** η_max, 0 … 1. */
  eta: number[];
  /** e.g. "Gap (mm)". */
  axisTitle: string;
  /** The unit in the hover read-out: "mm" or "°". */
  unit: string;
  /** The study's threshold, drawn on the axis of its quantity. */
  threshold: Threshold;
  uirevision: string;
}

/**
 * A curve of a gap or tilt sweep: k (left axis) and η_max in % (right axis) against the swept
 * value, with the study's threshold as a dashed line on the axis of its quantity.
 *
 * Trace order: 0 k, 1 η_max.
 */
export function couplingCurveFigure(input: CouplingCurveInput): PlotFigure {
  const hoverAt = `${input.axisTitle.replace(/ \(.*\)$/, '')} %{x:.2f} ${input.unit}`;
  const data: Data[] = [
    {
      type: 'scatter',
      mode: 'lines+markers',
      name: 'k',
      x: input.at,
      y: input.k,
      line: { color: plotColours.k, width: 2 },
      marker: { size: 5 },
      hovertemplate: `${hoverAt}<br>k %{y:.4f}<extra></extra>`,
    },
    {
      type: 'scatter',
      mode: 'lines',
      name: 'η_max',
      x: input.at,
      y: input.eta.map((v) => v * 100),
      yaxis: 'y2',
      line: { color: plotColours.eta, width: 2, dash: 'dot' },
      hovertemplate: `${hoverAt}<br>η_max %{y:.1f} %<extra></extra>`,
    },
  ];
  const onK = input.threshold.kind === 'k';
  const level = onK ? input.threshold.value : input.threshold.value * 100;
  const label = onK ? `k_min ${level}` : `η_min ${Number(level.toPrecision(4))} %`;
  const thresholdLine: Partial<Shape> = {
    type: 'line',
    xref: 'paper',
    x0: 0,
    x1: 1,
    yref: onK ? 'y' : 'y2',
    y0: level,
    y1: level,
    line: { color: plotColours.threshold, width: 1.5, dash: 'dash' },
  };
  return {
    data,
    layout: {
      ...baseLayout(input.uirevision),
      margin: { l: 60, r: 60, t: 16, b: 48 },
      xaxis: { title: { text: input.axisTitle }, zeroline: false },
      yaxis: { title: { text: 'k' }, rangemode: 'tozero', zeroline: false },
      yaxis2: {
        title: { text: 'η_max (%)' },
        overlaying: 'y',
        side: 'right',
        range: [0, 100],
        // Own ticks every 20 %, not ticks lined up with the k axis's grid.
        tickmode: 'linear',
        tick0: 0,
        dtick: 20,
        showgrid: false,
      },
      shapes: [thresholdLine],
      annotations: [
        {
          xref: 'paper',
          x: 1,
          xanchor: 'right',
          yref: onK ? 'y' : 'y2',
          y: level,
          yanchor: 'bottom',
          text: label,
          showarrow: false,
          font: { color: plotColours.threshold, size: 11 },
        },
      ],
    },
  };
}
