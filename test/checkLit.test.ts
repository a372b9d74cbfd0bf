import { Body, Equator, Horizon, MakeTime, Observer, SearchHourAngle } from './checkAstronomy.ts';
import { describe, expect, it } from 'vitest';
import { checkDial, dialFrame, isFaceLit, layoutDial, parseSpec, shadowOnFace, sunOnDay, sunTrack, toDialFrame } from '@umbrafab/geometry';

const DEG = Math.PI / 180;
const site = { latitude: 64.1, longitude: -21.9, timezone: 'Atlantic/Reykjavik' };
const layout = layoutDial(parseSpec({ site, hours: { from: '07:00', to: '17:00' }, calendar: { year: 2027 } }));
const observer = new Observer(site.latitude, site.longitude, 0);

/** astronomy-engine's own altitude and azimuth of the Sun (topocentric, of date, no refraction), degrees. */
function horizon(ms: number): { alt: number; az: number } {
  const t = MakeTime(new Date(ms));
  const eq = Equator(Body.Sun, t, observer, true, true);
  const h = Horizon(t, observer, eq.ra, eq.dec);
  return { alt: h.altitude, az: h.azimuth };
}

describe('no shadow while the Sun is below the horizon or behind the face', () => {
  // Cross-check with astronomy-engine Horizon altitude directly (docs/design.md §7).
  // The face normal points at the celestial equator on the meridian: azimuth
  // 180° (north site), altitude 90° − latitude (docs/design.md §2).
  it('every 10 minutes over three whole days at 64.1° N: shadow reported exactly when alt > 0 and the Sun is in front of the face', () => {
    const track = sunTrack({ latitudeDeg: site.latitude, longitudeDeg: site.longitude, timezone: site.timezone, year: 2027 });
    const frame = dialFrame({ latitudeDeg: site.latitude });
    const nAlt = 90 - site.latitude;
    const normal = [0, -Math.cos(nAlt * DEG), Math.sin(nAlt * DEG)];
    const counts = { lit: 0, below: 0, behind: 0 };
    for (const date of ['2027-03-20', '2027-06-21', '2027-12-21']) {
      const day = track.days.find((d) => d.date === date)!;
      for (let minute = 0; minute < 1440; minute += 10) {
        const ms = day.startMs + minute * 60_000;
        const s = sunOnDay(track, day, ms);
        const sun = toDialFrame(frame, s.enu);
        const reported = isFaceLit(s, sun) && shadowOnFace(layout, sun).length > 0;
        const { alt, az } = horizon(ms);
        const v = [Math.cos(alt * DEG) * Math.sin(az * DEG), Math.cos(alt * DEG) * Math.cos(az * DEG), Math.sin(alt * DEG)];
        const front = v[0] * normal[0] + v[1] * normal[1] + v[2] * normal[2];
        if (Math.abs(alt) < 0.01 || Math.abs(front) < 1e-4) continue; // too close to call at 0.05″
        expect(reported, `${date} ${minute} min: alt ${alt.toFixed(3)}°, front ${front.toFixed(4)}`).toBe(alt > 0 && front > 0);
        if (alt <= 0) counts.below++;
        else if (front <= 0) counts.behind++;
        else counts.lit++;
      }
    }
    console.log(`64.1° N, three days every 10 min: ${counts.lit} lit, ${counts.below} below the horizon, ${counts.behind} above it but behind the face`);
    expect(counts.behind).toBeGreaterThan(10); // the midsummer early mornings and late evenings
    expect(counts.below).toBeGreaterThan(10);
  });

  it('checkDial records no error for a (mark, day) when astronomy-engine puts the Sun below the horizon at that hour angle', () => {
    const r = checkDial(layout, { everyDays: 9 });
    let unlit = 0;
    let lit = 0;
    r.marks.forEach((m, i) => {
      const hours = (m.hourAngleDeg / 15 + 24) % 24;
      r.days.forEach((d, k) => {
        const start = new Date(Date.parse(`${d.date}T00:00:00Z`));
        const ev = SearchHourAngle(Body.Sun, observer, hours, start, +1);
        const { alt } = horizon(ev.time.date.getTime());
        if (Math.abs(alt) < 0.01) return;
        const e = r.marks[i].errorsMm[k];
        if (alt < 0) {
          expect(e, `${m.label} on ${d.date}: alt ${alt.toFixed(3)}°`).toBeNull();
          unlit++;
        } else {
          lit++;
        }
      });
      expect(m.litDays).toBeLessThanOrEqual(r.days.length);
    });
    console.log(`64.1° N dial 07:00-17:00, every 9th day: ${unlit} (mark, day) pairs with the Sun below the horizon, none reported; ${lit} lit`);
    expect(unlit).toBeGreaterThan(50);
  });
});
