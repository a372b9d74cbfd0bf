import { describe, expect, it } from 'vitest';
import { formatNumber } from './formatNumber.ts';

describe('formatNumber', () => {
  it('rounds to the decimals and never writes a negative zero', () => {
    expect(formatNumber(1.23456, 3)).toBe('1.235');
    expect(formatNumber(-0.0004, 3)).toBe('0.000');
    expect(formatNumber(-0, 3)).toBe('0.000');
    expect(formatNumber(-0.25, 3)).toBe('-0.250');
    expect(formatNumber(-0.4, 0)).toBe('0');
  });

  it('trims trailing zeros on request', () => {
    expect(formatNumber(400, 3, true)).toBe('400');
    expect(formatNumber(127.5, 3, true)).toBe('127.5');
    expect(formatNumber(-0.0001, 3, true)).toBe('0');
  });

  it('rejects a non-finite value', () => {
    expect(() => formatNumber(Number.POSITIVE_INFINITY, 3)).toThrow('value: got Infinity (not a finite number); a finite number is required');
  });
});
