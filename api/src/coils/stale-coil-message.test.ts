import { describe, expect, it } from 'vitest';
import { staleCoilMessage } from './stale-coil-message';

const at = new Date('2026-12-02T10:42:31Z');

describe('staleCoilMessage', () => {
  it('names who saved, when (UTC) and the version now stored', () => {
    expect(
      staleCoilMessage({
        by: 'Oskar Brandt',
        at,
        version: 4,
        sentVersion: 3,
        now: new Date('2026-12-02T11:00Z'),
      }),
    ).toBe(
      'This coil was changed by Oskar Brandt at 10:42 UTC (now version 4); ' +
        'reload to see their changes',
    );
  });

  it('adds the date when the save was on another day, and copes with a deleted user', () => {
    expect(
      staleCoilMessage({ by: null, at, version: 2, sentVersion: 1, now: new Date('2026-12-05') }),
    ).toBe(
      'This coil was changed on 2026-12-02 at 10:42 UTC (now version 2); reload to see their changes',
    );
  });

  it('says so when the version sent was never stored', () => {
    expect(staleCoilMessage({ by: 'Ines Varga', at, version: 2, sentVersion: 9, now: at })).toMatch(
      /^Version 9 of this coil does not exist; it was last changed by Ines Varga at 10:42/,
    );
  });
});
