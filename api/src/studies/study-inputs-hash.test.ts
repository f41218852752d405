import { describe, expect, it } from 'vitest';
import { studyInputsHash, type StudyComputeInputs } from './study-inputs-hash';

const ring = { kind: 'ring', radius: 0.02, wireRadius: 0.0005 } as const;
const inputs: StudyComputeInputs = {
  frequencyHz: 150e3,
  txCurrentA: 1,
  threshold: { kind: 'k', value: 0.1 },
  compensation: 'series-series',
  nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
  tx: ring,
  rx: ring,
};

describe('studyInputsHash', () => {
  it('does not depend on key order', () => {
    const reordered = {
      rx: { wireRadius: 0.0005, radius: 0.02, kind: 'ring' },
      tx: ring,
      nominalPose: { tiltY: 0, tiltX: 0, z: 0.004, y: 0, x: 0 },
      compensation: 'series-series',
      threshold: { value: 0.1, kind: 'k' },
      txCurrentA: 1,
      frequencyHz: 150e3,
    } as StudyComputeInputs;
    expect(studyInputsHash(reordered)).toBe(studyInputsHash(inputs));
  });

  it('changes when any compute input changes', () => {
    const base = studyInputsHash(inputs);
    expect(studyInputsHash({ ...inputs, frequencyHz: 140e3 })).not.toBe(base);
    expect(studyInputsHash({ ...inputs, rx: { ...ring, radius: 0.021 } })).not.toBe(base);
    expect(studyInputsHash({ ...inputs, threshold: { kind: 'eta', value: 0.1 } })).not.toBe(base);
    expect(base).toMatch(/^[0-9a-f]{64}$/);
  });
});
