import { Body, HourAngle, Observer } from 'astronomy-engine';
import { describe, expect, test } from 'vitest';
import { clockAtHourAngle } from './clockAtHourAngle.ts';
import { hourAngleAtClock } from './hourAngleAtClock.ts';

const LISBON = { longitudeDeg: -9.1393, timezone: 'Europe/Lisbon' };
const DEG = Math.PI / 180;

describe('hourAngleAtClock / clockAtHourAngle', () => {
  test('round trip within 1 ms of clock time', () => {
    let worst = 0;
    for (const date of ['2025-02-11', '2025-06-21', '2025-11-03']) {
      for (const hDeg of [-75, -45, -15, 0, 20, 60]) {
        for (const dst of [false, true]) {
          const r = clockAtHourAngle({ date, hourAngleRad: hDeg * DEG, ...LISBON, useDaylightSaving: dst });
          const back = hourAngleAtClock({ dateLocal: date, clock: formatPrecise(r.clockMinutes), ...LISBON, daylightSaving: dst });
          worst = Math.max(worst, Math.abs(back - hDeg * DEG) / DEG * 240); // seconds of time
        }
      }
    }
    console.log(`hour angle ↔ clock round trip: largest difference ${worst.toExponential(2)} s`);
    expect(worst).toBeLessThan(0.001);
  });

  // astronomy-engine HourAngle (topocentric, general-purpose ephemeris): within 1 s of time (15″).
  test('hourAngleAtClock agrees with astronomy-engine HourAngle', () => {
    const observer = new Observer(38.7223, LISBON.longitudeDeg, 0);
    let worst = 0;
    for (const [dateLocal, clock, dst, utcIso] of [
      ['2025-06-21', '14:00', true, '2025-06-21T13:00:00Z'],
      ['2025-01-15', '09:30', false, '2025-01-15T09:30:00Z'],
      ['2025-10-26', '16:15', false, '2025-10-26T16:15:00Z'],
    ] as const) {
      const h = hourAngleAtClock({ dateLocal, clock, ...LISBON, daylightSaving: dst });
      let ha = HourAngle(Body.Sun, new Date(utcIso), observer);
      if (ha > 12) ha -= 24;
      worst = Math.max(worst, (Math.abs(h - ha * 15 * DEG) / DEG) * 240);
    }
    console.log(`hourAngleAtClock vs HourAngle: largest difference ${worst.toFixed(3)} s of time`);
    expect(worst).toBeLessThan(1);
  });

  test('daylight saving: the same instant reads one hour later', () => {
    const std = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, ...LISBON, useDaylightSaving: false });
    const dst = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, ...LISBON, useDaylightSaving: true });
    const auto = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, ...LISBON });
    expect(dst.clockMinutes - std.clockMinutes).toBeCloseTo(60, 9);
    expect(auto.clockMinutes).toBeCloseTo(dst.clockMinutes, 9);
    expect(dst.utc.getTime()).toBe(std.utc.getTime());
    const h1 = hourAngleAtClock({ dateLocal: '2025-06-21', clock: '13:00', ...LISBON, daylightSaving: true });
    const h0 = hourAngleAtClock({ dateLocal: '2025-06-21', clock: '12:00', ...LISBON, daylightSaving: false });
    expect(h1).toBeCloseTo(h0, 12);
  });

  test('a zone without daylight saving gets +1 h when asked for summer numerals', () => {
    const std = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, longitudeDeg: 88.36, timezone: 'Asia/Kolkata', useDaylightSaving: false });
    const dst = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, longitudeDeg: 88.36, timezone: 'Asia/Kolkata', useDaylightSaving: true });
    expect(dst.clockMinutes - std.clockMinutes).toBeCloseTo(60, 9);
    expect(std.daylightSaving).toBe(false);
  });

  test('formula: H = 15°(T − 12 h) + (λ − λs) + E/4', () => {
    const r = clockAtHourAngle({ date: '2025-03-01', hourAngleRad: 30 * DEG, ...LISBON, useDaylightSaving: false });
    const t = r.clockMinutes / 60;
    const h = 15 * (t - 12) + (LISBON.longitudeDeg - 0) + r.equationOfTimeMin / 4;
    expect(h).toBeCloseTo(30, 6);
  });

  test('zone meridian across the date line (Pacific/Kiritimati, UTC+14)', () => {
    const r = clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 0, longitudeDeg: -157.4, timezone: 'Pacific/Kiritimati' });
    // λ − λs = −157.4° − 210° ≡ −7.4°: noon about 12:30 − E (E ≈ −1.9 min).
    expect(r.clock.startsWith('12:3')).toBe(true);
  });

  test('rejects bad input, naming the field', () => {
    expect(() => hourAngleAtClock({ dateLocal: '2025-06-21', clock: '25:00', ...LISBON, daylightSaving: false })).toThrow(/clock/);
    expect(() => hourAngleAtClock({ dateLocal: '2025-06-21', clock: '12:00', ...LISBON, daylightSaving: 'yes' as unknown as boolean })).toThrow(/daylightSaving/);
    expect(() => clockAtHourAngle({ date: '2025-06-21', hourAngleRad: Number.NaN, ...LISBON })).toThrow(/hourAngleRad/);
    expect(() => clockAtHourAngle({ date: '2025-06-21', hourAngleRad: 3.1, longitudeDeg: 179, timezone: 'Pacific/Kiritimati' })).toThrow(/outside that date/);
  });
});

/** Minutes after midnight → 'HH:MM:SS.ssssss' (keeps sub-second precision for the round trip). */
function formatPrecise(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = Math.floor(minutes - h * 60);
  const s = (minutes - h * 60 - m) * 60;
  return `${String(h).padStart(2, '0')}:${String(m).padStart(2, '0')}:${s.toFixed(6).padStart(9, '0')}`;
}
