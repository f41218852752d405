import { formatQuantity } from './format-quantity';

// Engineering notation: prefixes in powers of 1000, mantissa in [1, 1000) (SI Brochure, 9th
// edition, 2019, for the prefixes; the engineering-notation convention is common practice).
describe('formatQuantity', () => {
  it('picks the engineering prefix and three significant digits', () => {
    expect(formatQuantity(0.045, 'm')).toBe('45.0 mm');
    expect(formatQuantity(1.23e-5, 'H')).toBe('12.3 µH');
    expect(formatQuantity(142e3, 'Hz')).toBe('142 kHz');
    expect(formatQuantity(6.78e6, 'Hz')).toBe('6.78 MHz');
    expect(formatQuantity(0.0123, 'Ω')).toBe('12.3 mΩ');
    expect(formatQuantity(2.5e-10, 'H')).toBe('250 pH');
  });

  it('rolls over to the next prefix when rounding reaches 1000', () => {
    expect(formatQuantity(0.99996, 'm')).toBe('1.00 m');
    expect(formatQuantity(999.6e3, 'Hz')).toBe('1.00 MHz');
  });

  it('keeps lengths at or below metres and spells large ones out', () => {
    expect(formatQuantity(2.5, 'm')).toBe('2.50 m');
    expect(formatQuantity(1500, 'm')).toBe('1500 m');
  });

  it('handles zero, negatives, angles, plain numbers and non-finite values', () => {
    expect(formatQuantity(0, 'H')).toBe('0.00 H');
    expect(formatQuantity(-0.002, 'm')).toBe('-2.00 mm');
    expect(formatQuantity(3, 'deg')).toBe('3.00°');
    expect(formatQuantity(41.5, '1')).toBe('41.5');
    expect(formatQuantity(Number.NaN, 'H')).toBe('—');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'm')).toBe('—');
  });

  it('takes other digit counts and trims zeros on request', () => {
    expect(formatQuantity(1e-4, 'm', { digits: 4, trim: true })).toBe('100 µm');
    expect(formatQuantity(10, 'm', { digits: 4, trim: true })).toBe('10 m');
    expect(formatQuantity(0.0451234, 'm', { digits: 5 })).toBe('45.123 mm');
  });
});
