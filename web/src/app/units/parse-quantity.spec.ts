import { parseQuantity, type ParseQuantityOptions } from './parse-quantity';

// Conversion factors: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959);
// 1 mil = 0.001 in; the SI prefixes k = 1e3, µ = 1e-6 (SI Brochure, 9th edition, 2019).
describe('parseQuantity', () => {
  const length: ParseQuantityOptions = { unit: 'm', bare: 'mm' };
  const value = (text: string, options: ParseQuantityOptions = length): number => {
    const result = parseQuantity(text, options);
    if ('error' in result) throw new Error(`${text}: ${result.error}`);
    return result.value;
  };
  const error = (text: string, options: ParseQuantityOptions = length): string => {
    const result = parseQuantity(text, options);
    if ('value' in result) throw new Error(`${text}: read as ${result.value}, expected an error`);
    return result.error;
  };

  it('reads lengths in metric and inch units into metres', () => {
    expect(value('45 mm')).toBeCloseTo(0.045, 15);
    expect(value('45mm')).toBeCloseTo(0.045, 15);
    expect(value('0.2 in')).toBeCloseTo(0.00508, 15);
    expect(value('2 mil')).toBeCloseTo(50.8e-6, 15);
    expect(value('1.2 cm')).toBeCloseTo(0.012, 15);
    expect(value('1e-3 m')).toBeCloseTo(0.001, 15);
  });

  it('reads a bare number in the field display unit', () => {
    expect(value('45')).toBeCloseTo(0.045, 15);
    expect(value('.5')).toBeCloseTo(0.0005, 15);
    expect(value('12', { unit: 'm', bare: 'm' })).toBe(12);
    expect(value('3', { unit: 'm' })).toBe(3);
  });

  it('reads a decimal comma when it is the only separator', () => {
    expect(value('0,2 in')).toBeCloseTo(0.00508, 15);
  });

  it('reads frequencies, currents, inductances and angles', () => {
    expect(value('120 kHz', { unit: 'Hz', bare: 'kHz' })).toBeCloseTo(120e3, 9);
    expect(value('6.78 MHz', { unit: 'Hz', bare: 'kHz' })).toBeCloseTo(6.78e6, 6);
    expect(value('85', { unit: 'Hz', bare: 'kHz' })).toBeCloseTo(85e3, 9);
    expect(value('1.5 A', { unit: 'A', bare: 'A' })).toBe(1.5);
    expect(value('250 mA', { unit: 'A', bare: 'A' })).toBeCloseTo(0.25, 15);
    expect(value('12 µH', { unit: 'H', bare: 'uH' })).toBeCloseTo(12e-6, 18);
    expect(value('12 uH', { unit: 'H', bare: 'uH' })).toBeCloseTo(12e-6, 18);
    // Angles are stored in degrees (the pose convention), not radians.
    expect(value('3 deg', { unit: 'deg', bare: 'deg' })).toBeCloseTo(3, 12);
    expect(value('3', { unit: 'deg', bare: 'deg' })).toBe(3);
  });

  it('reads plain numbers for unitless fields and refuses a unit there', () => {
    expect(value('2000', { unit: '1' })).toBe(2000);
    expect(error('12 mm', { unit: '1' })).toMatch(/plain number/);
  });

  it('refuses a frequency in a length field and says what it is', () => {
    expect(error('45 kHz')).toBe('“45 kHz” is a frequency; expected a length, e.g. 45 mm');
    expect(error('3 A')).toMatch(/is a current; expected a length/);
  });

  it('refuses text it cannot read, a unit alone, and empty text', () => {
    expect(error('abc')).toMatch(/^Cannot read “abc”/);
    expect(error('mm')).toMatch(/Add a number before the unit/);
    expect(error('  ')).toMatch(/Enter a length/);
    expect(error('1/2 in')).toMatch(/^Cannot read/);
    expect(error('45 mm mm')).toMatch(/expected a length/);
  });
});
