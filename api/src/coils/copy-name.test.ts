import { describe, expect, it } from 'vitest';
import { copyName } from './copy-name';

describe('copyName', () => {
  it('takes "(copy)" first, then the lowest free "(copy n)"', () => {
    expect(copyName('Tx A', [])).toBe('Tx A (copy)');
    expect(copyName('Tx A', ['Tx A', 'Tx A (copy)'])).toBe('Tx A (copy 2)');
    expect(copyName('Tx A', ['Tx A (copy)', 'Tx A (copy 2)', 'Tx A (copy 4)'])).toBe(
      'Tx A (copy 3)',
    );
  });

  it('compares names case-insensitively', () => {
    expect(copyName('Tx A', ['TX A (COPY)'])).toBe('Tx A (copy 2)');
  });

  it('shortens the original with an ellipsis to stay within 80 characters', () => {
    const long = 'x'.repeat(80);
    const first = copyName(long, []);
    expect(first).toHaveLength(80);
    expect(first).toBe(`${'x'.repeat(72)}… (copy)`);
    const second = copyName(long, [first]);
    expect(second).toHaveLength(80);
    expect(second.endsWith('… (copy 2)')).toBe(true);
  });
});
