import { describe, expect, it } from 'vitest';
import { parseSpec } from './parseSpec.ts';

const site = { latitude: 41.15, longitude: -8.61, timezone: 'Europe/Lisbon' };

describe('parseSpec', () => {
  it('fills defaults, with kerf and clearance by method', () => {
    const s = parseSpec({ site });
    expect(s.gnomon).toMatchObject({ height: 50, thickness: 3 });
    expect(s.hours).toMatchObject({ from: '07:00', to: '17:00', step: 15 });
    expect(s.process).toEqual({ method: 'laser', kerf: 0.15, clearance: 0.1 });
    expect(parseSpec({ site, process: { method: 'waterjet' } }).process.kerf).toBe(0.9);
    expect(parseSpec({ site, process: { method: 'print' } }).process.clearance).toBe(0.2);
    expect(parseSpec({ site, process: { method: 'router', kerf: 6 } }).process.kerf).toBe(6);
  });

  it('suggests the field a misspelt name meant', () => {
    expect(() => parseSpec({ site, gnomon: { hieght: 40 } })).toThrow(/gnomon\.hieght: unknown field \(did you mean gnomon\.height\?\)/);
    expect(() => parseSpec({ site: { ...site, lattitude: 3 } })).toThrow(/did you mean site\.latitude/);
  });

  it('names field, value and what is allowed', () => {
    expect(() => parseSpec({ site: { ...site, latitude: 95 } })).toThrow('site.latitude: got 95; allowed: a number from -90° to 90°');
    expect(() => parseSpec({ site, gnomon: { height: 0 } })).toThrow(/gnomon\.height: got 0; allowed: a number greater than 0/);
    expect(() => parseSpec({ site, hours: { from: '12:00', to: '09:00' } })).toThrow(/hours\.to/);
  });
});
