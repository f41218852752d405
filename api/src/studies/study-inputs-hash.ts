import { createHash } from 'node:crypto';
import type { StudyComputeInputs } from './studies-dto';

export type { StudyComputeInputs };

/**
 * sha256 (hex) of the canonical JSON of a study's compute inputs: object keys sorted at every
 * level, so the same inputs always give the same hash whatever order a client sent them in. A
 * sweep run or revision whose hash differs from the study's was computed from other inputs.
 */
export function studyInputsHash(inputs: StudyComputeInputs): string {
  return createHash('sha256').update(canonicalJson(inputs)).digest('hex');
}

function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}
