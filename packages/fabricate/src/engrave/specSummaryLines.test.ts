import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { specSummaryLines } from './specSummaryLines.ts';

describe('specSummaryLines', () => {
  const spec = {
    name: 'Quay (north)',
    site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London', place: undefined },
    parts: {},
    calendar: { lines: ['solstices', 'equinox'] },
    engrave: { programs: 'both', tool: { vbitAngleDeg: 90, vbitTipMm: 0 }, feedMmPerMin: undefined },
  };

  it('writes one YAML flow line per section, leaving out empty sections and unset fields', () => {
    expect(specSummaryLines(spec)).toEqual([
      'name: "Quay (north)"',
      'site: {latitude: 50.62, longitude: -3.41, timezone: "Europe/London"}',
      'calendar: {lines: ["solstices", "equinox"]}',
      'engrave: {programs: "both", tool: {vbitAngleDeg: 90, vbitTipMm: 0}}',
    ]);
  });

  it('lines paste back as YAML with the same values', () => {
    const back = Object.assign({}, ...specSummaryLines(spec).map((l) => parse(l)));
    expect(back.site).toEqual({ latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' });
    expect(back.engrave.tool.vbitAngleDeg).toBe(90);
  });

  it('splits a section longer than maxChars into dotted lines', () => {
    expect(specSummaryLines({ engrave: spec.engrave }, 50)).toEqual(['engrave.programs: "both"', 'engrave.tool: {vbitAngleDeg: 90, vbitTipMm: 0}']);
  });
});
