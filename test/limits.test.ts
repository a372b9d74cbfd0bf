import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';
import { runAdmesh } from './helpers/admesh.ts';
import { runCli } from './helpers/runCli.ts';
import { stringify } from 'yaml';

// Documented bounds for extreme specs (README "Limits"): each works and passes
// the outside validators (ezdxf audit, admesh), or is refused with exit 1 and
// a reason naming the field.
const site = { latitude: 45, longitude: 0, timezone: 'UTC' };
const quick = { pictures: { write: false }, template: { write: false } };

async function buildAndValidate(raw: object) {
  const r = await buildFiles(parseSpec({ ...raw, ...quick }));
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-limits-'));
  for (const f of r.files) writeFileSync(join(dir, f.name), f.bytes);
  for (const f of r.files.filter((x) => x.name.endsWith('.dxf'))) {
    const d = ezdxfDump(join(dir, f.name));
    expect(d.errors, f.name).toEqual([]);
    expect(d.insunits).toBe(4);
  }
  for (const f of r.files.filter((x) => x.name.endsWith('.stl'))) {
    const a = runAdmesh(join(dir, f.name));
    expect(a.degenerateFacets, f.name).toBe(0);
    expect(a.edgesFixed, f.name).toBe(0);
    // one closed body per part; stand.stl holds each piece of the assembled stand as its own shell
    expect(a.parts, f.name).toBe(f.name === 'stand.stl' ? r.report.stand!.parts.reduce((n, p) => n + p.quantity, 0) : 1);
  }
  return r;
}

async function refused(raw: object): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-limits-'));
  const spec = join(dir, 'spec.yaml');
  writeFileSync(spec, stringify(raw));
  const r = await runCli(['build', spec, '--out', join(dir, 'out')]);
  expect(r.code).toBe(1);
  return r.err;
}

describe('limits of extreme specs', () => {
  it('a 2 m plate works (fixed 2000 × 1400 mm, 250 mm gnomon)', async () => {
    const r = await buildAndValidate({ site, plate: { width: 2000, length: 1400, thickness: 10, material: 'stainless' }, gnomon: { height: 250 }, marks: { hour: { length: 1000 }, half: { length: 700 }, quarter: { length: 400 } }, dial: { numeralHeight: 40, textHeight: 20 }, process: { method: 'waterjet' } });
    expect(r.layout.plate.widthMm).toBe(2000);
  });

  it('a 2 m plate too narrow for its hours is refused with the range that fits', async () => {
    expect(await refused({ site, plate: { width: 2000, length: 2000 }, gnomon: { height: 400 }, marks: { hour: { length: 1200 } } })).toMatch(/plate\.width: the lines for 07:00, 07:15, 16:45, 17:00 fall off a 2000 mm plate.*narrow hours to 07:30–16:30/);
  });

  it('a 0.5 mm gnomon works, printed or cut from 0.5 mm sheet', async () => {
    const printed = await buildAndValidate({ site, gnomon: { thickness: 0.5 }, process: { method: 'print' } });
    expect(printed.layout.gnomon.thicknessMm).toBe(0.5);
    const sheet = await buildAndValidate({ site, plate: { thickness: 0.5, material: 'brass' }, engrave: { programs: 'none' } });
    expect(sheet.layout.gnomon.thicknessMm).toBe(0.5);
  });

  it('a latitude of 89.9° is refused: the wedge would stand vertical', async () => {
    expect(await refused({ site: { ...site, latitude: 89.9 } })).toMatch(/site\.latitude: got 89\.9, so the latitude wedge cannot be made.*at most 89°/);
  });

  it('5-minute marks are refused: marks are hours, halves and quarters', async () => {
    expect(await refused({ site, hours: { step: 5 } })).toMatch(/hours\.step: got 5; allowed: 60, 30 or 15 \(minutes\)/);
  });
});
