import { copyFileSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');

describe('umbrafab wall and umbrafab check on planar faces', () => {
  it('wall: a synthetic reading at a known wall (Sun azimuth from astronomy-engine) is recovered within 0.1° and written into the spec', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-wall-'));
    const spec = join(dir, 'wall.yaml');
    copyFileSync(join(ROOT, 'fixtures/planar/wall-reclining.yaml'), spec);
    // A wall 12.5° west of due north at 33.9°S: normal azimuth −12.5° = 347.5°; two readings (Africa/Johannesburg, UTC+2).
    const D = 12.5;
    const obs = new Observer(-33.9, 18.4, 0);
    const reading = (utc: Date, local: string) => {
      const t = MakeTime(utc);
      const eq = Equator(Body.Sun, t, obs, true, true);
      const az = Horizon(t, obs, eq.ra, eq.dec).azimuth;
      const theta = (((az - (360 - D) + 90) % 360) + 360) % 360;
      return `${local} ${theta.toFixed(4)}`;
    };
    const r = await runCli(['wall', spec, '--reading', reading(new Date(Date.UTC(2027, 4, 3, 9, 0, 0)), '2027-05-03 11:00:00'), '--reading', reading(new Date(Date.UTC(2027, 4, 3, 10, 20, 30)), '2027-05-03 12:20:30'), '--write']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/spread of the 2 readings/);
    const written = parse(readFileSync(spec, 'utf8'));
    console.log(`umbrafab wall: wrote face.wallDeclination ${written.face.wallDeclination} for ${D} (error ${Math.abs(written.face.wallDeclination - D).toFixed(4)}°)`);
    expect(written.face.type).toBe('vertical');
    expect(Math.abs(written.face.wallDeclination - D)).toBeLessThan(0.1);
    expect(readFileSync(spec, 'utf8')).toMatch(/^# An invented sloping-roof dial/);
  });

  it('wall: a malformed reading is a usage error (exit 1), the spec untouched', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-wall-'));
    const spec = join(dir, 'wall.yaml');
    copyFileSync(join(ROOT, 'fixtures/planar/wall-reclining.yaml'), spec);
    const before = readFileSync(spec, 'utf8');
    const r = await runCli(['wall', spec, '--reading', 'noon 45', '--write']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--reading 1/);
    expect(readFileSync(spec, 'utf8')).toBe(before);
  });

  it('check: a meridian face passes and writes check.json', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-pcheck-'));
    const r = await runCli(['check', join(ROOT, 'fixtures/planar/meridian-east.yaml'), '--out', dir]);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/pass: every line and curve within tolerance/);
    const json = JSON.parse(readFileSync(join(dir, 'check.json'), 'utf8'));
    expect(json.faceType).toBe('meridian');
    expect(json.pass).toBe(true);
  });
});
