import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import geomagnetism from 'geomagnetism';

const sites = [
  { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' },
  { latitude: -42.88, longitude: 147.33, timezone: 'Australia/Hobart' },
  { latitude: 64.1, longitude: -21.9, timezone: 'Atlantic/Reykjavik' },
  { latitude: 47.6, longitude: -122.3, timezone: 'America/Los_Angeles' },
];

const text = (b: Uint8Array) => new TextDecoder().decode(b);

describe('install.md', () => {
  it('states the magnetic declination and the turn with the right direction (checked against geomagnetism directly)', async () => {
    const signs = new Set<number>();
    for (const site of sites) {
      const built = await buildFiles(parseSpec({ site, calendar: { year: 2027 }, install: { date: '2027-05-10' } }));
      const md = text(built.files.find((f) => f.name === 'install.md')!.bytes);
      // geomagnetism 0.2.0 (WMM2025 coefficients, NOAA NCEI / BGS): a general-purpose reference library.
      const d = geomagnetism.model(new Date('2027-05-10T12:00:00Z')).point([site.latitude, site.longitude]).decl;
      const shown = Math.abs(d).toFixed(1);
      const needle = d > 0 ? 'east' : 'west';
      const turn = d > 0 ? 'west' : 'east';
      // North: the raised end points to true north; south: to true south (the compass's south end is turned by the same declination).
      expect(md).toContain(
        site.latitude >= 0
          ? `magnetic north lies ${shown}° ${needle} of true north: turn the dial ${shown}° ${turn} of the compass's north to face true north`
          : `magnetic north lies ${shown}° ${needle} of true north, so the compass's south end points ${shown}° ${turn} of true south: turn the dial until its raised end points ${shown}° ${needle} of the compass's south, at true south`,
      );
      signs.add(Math.sign(d));
      console.log(`${site.timezone}: WMM2025 declination ${d.toFixed(2)}°, sheet says ${shown}° ${needle}`);
    }
    expect([...signs].sort()).toEqual([-1, 1]);
  });

  it('gives the tilt, the rise over the plate length, the cautions and the marks the Sun reaches', async () => {
    const site = sites[0];
    const built = await buildFiles(parseSpec({ site, dial: { reads: 'standard' }, hours: { from: '08:00', to: '16:00' }, calendar: { year: 2027 } }));
    const md = text(built.files.find((f) => f.name === 'install.md')!.bytes);
    const inst = built.report.install;
    expect(inst.date).toBe('2027-04-01'); // default: April 1 of calendar.year, never today
    const L = built.layout.plate.lengthMm;
    expect(inst.tilt.angleDeg).toBe(50.62);
    // Rise of the raised end over a plate of length L tilted by φ: L·sin φ (trigonometry).
    expect(inst.tilt.riseMm).toBeCloseTo(L * Math.sin((50.62 * Math.PI) / 180), 9);
    expect(md).toContain('**50.6°**');
    expect(md).toContain(`**${Math.round(L * Math.sin((50.62 * Math.PI) / 180))} mm**`);
    expect(md).toMatch(/Never look at the Sun.*optics/);
    expect(md).toContain('local building codes');
    expect(md).toContain('lifted by two people');
    expect(inst.reach.every((r) => r.reached)).toBe(true);
    expect(inst.reach.length).toBe(33); // 08:00–16:00 every 15 min
    expect(md).toContain('All 33 marks are reached');
  });

  it('counts fewer days for an early mark than for noon at a high latitude (Sun above the horizon, |H| < 90°)', async () => {
    const built = await buildFiles(parseSpec({ site: sites[2], hours: { from: '07:00', to: '17:00', step: 60 }, calendar: { year: 2027 } }));
    const reach = built.report.install.reach;
    const at = (l: string) => reach.find((r) => r.label === l)!.daysReached;
    // At 64.1° N the Sun is above the horizon at H = −75° only when δ > about −7.5° (tan δ > −cos H / tan φ).
    expect(at('12:00')).toBe(365);
    expect(at('07:00')).toBeLessThan(365);
    expect(at('07:00')).toBeGreaterThan(200);
  });
});
