import type { Threshold } from '../api-types';

/** The threshold as a label: "k ≥ 0.25" or "η ≥ 85 %". */
export function thresholdText(threshold: Threshold): string {
  return threshold.kind === 'k'
    ? `k ≥ ${threshold.value}`
    : `η ≥ ${Number((threshold.value * 100).toPrecision(4))} %`;
}
