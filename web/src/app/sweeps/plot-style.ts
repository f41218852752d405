import type { ColorScale, Layout } from 'plotly.js-dist-min';

/**
 * Couplet's own colour scale for coupling maps ("tide"): paper white through sage and teal to a
 * deep blue-green, one hue family rising in darkness with k, so the strong-coupling centre reads
 * dark and the map prints legibly in grey. The envelope line is drawn in copper, which no step of
 * the scale comes near.
 */
export const tideScale: ColorScale = [
  [0, '#f6f3ea'],
  [0.25, '#cfe5dc'],
  [0.5, '#7fbfba'],
  [0.75, '#2e8a8f'],
  [1, '#123f4f'],
];

export const plotColours = {
  k: '#1f7479',
  eta: '#b35a26',
  envelope: '#c0612b',
  contour: 'rgba(16, 42, 50, 0.35)',
  nominal: '#1b1b1b',
  threshold: '#7a2e12',
  grid: 'rgba(0, 0, 0, 0.08)',
} as const;

/** The parts of a layout every sweep plot shares: our font, no background, tight margins. */
export function baseLayout(uirevision: string): Partial<Layout> {
  return {
    autosize: true,
    uirevision,
    font: { family: 'Work Sans, system-ui, sans-serif', size: 12, color: '#1b1c1c' },
    paper_bgcolor: 'rgba(0, 0, 0, 0)',
    plot_bgcolor: 'rgba(0, 0, 0, 0)',
    margin: { l: 60, r: 24, t: 16, b: 48 },
    hoverlabel: { font: { family: 'Work Sans, system-ui, sans-serif' } },
    legend: { orientation: 'h', x: 0, y: -0.16, yanchor: 'top' },
  };
}
