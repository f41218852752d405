import { describe, expect, it } from 'vitest';
import { parseWorkerConfig } from './worker-config';

describe('parseWorkerConfig', () => {
  it('needs only the database; one thread unless told', () => {
    expect(parseWorkerConfig({ DATABASE_URL: 'postgres://app@db.example/couplet' })).toEqual({
      databaseUrl: 'postgres://app@db.example/couplet',
      threads: 1,
      logLevel: 'info',
    });
    expect(
      parseWorkerConfig({ DATABASE_URL: 'postgres://app@db/c', SWEEP_WORKERS: '4' }).threads,
    ).toBe(4);
  });

  it('fails loudly, naming the variable', () => {
    expect(() => parseWorkerConfig({})).toThrow(/DATABASE_URL/);
    expect(() =>
      parseWorkerConfig({ DATABASE_URL: 'postgres://app@db/c', SWEEP_WORKERS: '0' }),
    ).toThrow(/SWEEP_WORKERS/);
  });
});
