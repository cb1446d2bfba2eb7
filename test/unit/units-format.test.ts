// Formatting numbers for fields and results.
import { describe, expect, it } from 'vitest';
import {
  formatForInput,
  formatNumber,
  formatNumberForInput,
  formatQuantity,
} from '../../forms/units/index.js';

describe('formatForInput', () => {
  it('removes binary noise and trailing zeros', () => {
    expect(formatForInput(0.1 + 0.2, 'length', 'si')).toBe('0.3');
    expect(formatForInput(3, 'length', 'si')).toBe('3');
  });
  it('shows a metric value in feet with a few decimals, not eighteen', () => {
    expect(formatForInput(2.7, 'length', 'us')).toBe('8.85827');
  });
  it('never uses exponent notation', () => {
    expect(formatNumberForInput(1e-7, 'm')).toBe('0');
    expect(formatNumberForInput(123456789, 'N')).toBe('123456789');
  });
  it('does not show minus zero', () => {
    expect(formatNumberForInput(-0.0000001, 'm')).toBe('0');
  });
  it('refuses NaN', () => {
    expect(() => formatNumberForInput(NaN, 'm')).toThrow(/got NaN/);
  });
});

describe('formatQuantity', () => {
  it('rounds to the display decimals of the shown unit', () => {
    expect(formatQuantity(2.7432, 'length', 'si')).toBe('2.74');
    expect(formatQuantity(2.7432, 'length', 'us')).toBe('9.00');
    expect(formatQuantity(0.0125, 'smallLength', 'si')).toBe('13');
    expect(formatQuantity(0.0042, 'percent', 'si')).toBe('0.42');
  });
  it('takes explicit decimals and never prints -0', () => {
    expect(formatNumber(-0.001, 'm', 1)).toBe('0.0');
    expect(formatNumber(1.25, 'g', 1)).toBe('1.3');
  });
});
