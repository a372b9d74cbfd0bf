import { Body, Equator, Horizon, Observer, SearchHourAngle, Seasons } from './checkAstronomy.ts';
import { describe, expect, it } from 'vitest';
import { dialFrame, eastToFaceX, gnomonForLayout, instantAtHourAngle, layoutDial, parseSpec, shadowOnFace, shadowOnLine, styleEdges, sunOnDay, sunTrack, toDialFrame } from '@umbrafab/geometry';

const DEG = Math.PI / 180;

const sites = [
  { name: 'north (demo site)', site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' } },
  { name: 'south', site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' } },
];

/** Unit vector (east, north, up) from astronomy-engine Horizon azimuth/altitude, degrees. */
const enu = (az: number, alt: number) => [Math.cos(alt * DEG) * Math.sin(az * DEG), Math.cos(alt * DEG) * Math.cos(az * DEG), Math.sin(alt * DEG)] as const;

describe.each(sites)('the 45° check on the March equinox of 2027: $name', ({ site }) => {
  const layout = layoutDial(parseSpec({ site, hours: { from: '08:00', to: '16:00' }, calendar: { year: 2027 } }));
  const h = layout.gnomon.heightMm;
  const t = layout.gnomon.thicknessMm;
  const part = gnomonForLayout(layout);
  const edges = styleEdges(part.mesh);
  const frame = dialFrame({ latitudeDeg: site.latitude });
  const observer = new Observer(site.latitude, site.longitude, 0);
  const equinox = Seasons(2027).mar_equinox.date; // astronomy-engine (docs/design.md §7)

  // Common practice (the 45° triangle check, docs/design.md §2): at 09:00 and 15:00
  // apparent solar time (|H| = 45°) the shadow of the style edge lies exactly
  // one gnomon height beyond that edge.
  it.each([
    ['09:00', 21, 'west'],
    ['15:00', 3, 'east'],
  ] as const)('at %s apparent time the shadow falls h from the casting style edge', (_label, hourAngleHours, style) => {
    // The instant from astronomy-engine itself: SearchHourAngle (topocentric, of date).
    const dayStart = new Date(Date.UTC(2027, 2, equinox.getUTCDate(), 0) - (site.longitude / 15) * 3.6e6);
    const ev = SearchHourAngle(Body.Sun, observer, hourAngleHours, dayStart, +1);
    const eq = Equator(Body.Sun, ev.time, observer, true, true);
    const hor = Horizon(ev.time, observer, eq.ra, eq.dec);
    const sun = toDialFrame(frame, enu(hor.azimuth, hor.altitude));
    const side = eastToFaceX(style === 'east' ? 1 : -1, layout.hemisphere);
    const edgeX = (side * t) / 2;
    const line = shadowOnLine(side > 0 ? edges.plusX : edges.minusX, sun, [edgeX + side * h, -20], [edgeX + side * h, 20]);
    expect(line).not.toBeNull();
    const distance = Math.abs(line!.shadowXMm - edgeX);
    console.log(`${site.latitude}°, ${_label} apparent (${ev.time.date.toISOString()}): shadow ${distance.toFixed(6)} mm from the style edge, h = ${h} mm, declination ${eq.dec.toFixed(3)}°`);
    expect(Math.abs(distance - h)).toBeLessThan(1e-4);
    // The whole shadow polygon reaches the same x.
    const xs = shadowOnFace(layout, sun, part).flatMap((p) => p.points.map((q) => q[0]));
    expect(Math.abs((side > 0 ? Math.max(...xs) : Math.min(...xs)) - edgeX) - h).toBeLessThan(1e-4);
    // And the fast track agrees: same hour angle, same shadow to 1 µm.
    const track = sunTrack({ latitudeDeg: site.latitude, longitudeDeg: site.longitude, timezone: site.timezone, year: 2027 });
    const day = track.days.find((d) => d.date === ev.time.date.toISOString().slice(0, 10)) ?? track.days[78];
    const ms = instantAtHourAngle(track, day, (hourAngleHours > 12 ? hourAngleHours - 24 : hourAngleHours) * 15 * DEG);
    expect(Math.abs(ms - ev.time.date.getTime())).toBeLessThan(1000); // SearchHourAngle is good to about a second
    const fast = shadowOnLine(side > 0 ? edges.plusX : edges.minusX, toDialFrame(frame, sunOnDay(track, day, ms).enu), [edgeX + side * h, -20], [edgeX + side * h, 20]);
    expect(Math.abs(fast!.shadowXMm - edgeX) - h).toBeLessThan(1e-6);
  });
});
