import { describe, expect, test } from 'vitest';
import { dialFrame, toDialFrame } from './dialFrame.ts';

const DEG = Math.PI / 180;

/** ENU unit vector of a body at hour angle H and declination δ seen from latitude φ (spherical astronomy, common practice). */
function enu(H: number, dec: number, lat: number): [number, number, number] {
  return [-Math.cos(dec) * Math.sin(H), Math.cos(lat) * Math.sin(dec) - Math.sin(lat) * Math.cos(dec) * Math.cos(H), Math.sin(lat) * Math.sin(dec) + Math.cos(lat) * Math.cos(dec) * Math.cos(H)];
}

describe('dialFrame', () => {
  // docs/design.md §2: s = (−cos δ sin H, sin δ, cos δ cos H) with x east-positive and δ toward the elevated pole.
  test.each([50.62, 12, 78])('north %f°: the ideal frame gives the polar-dial sun vector of docs/design.md §2', (latDeg) => {
    const f = dialFrame({ latitudeDeg: latDeg });
    for (const [hDeg, dDeg] of [[-60, 20], [0, -23.4], [35, 5], [80, 23.4]]) {
      const s = toDialFrame(f, enu(hDeg * DEG, dDeg * DEG, latDeg * DEG));
      const H = hDeg * DEG;
      const d = dDeg * DEG;
      const want = [-Math.cos(d) * Math.sin(H), Math.sin(d), Math.cos(d) * Math.cos(H)];
      for (let k = 0; k < 3; k++) expect(s[k]).toBeCloseTo(want[k], 12);
    }
  });

  test('south: face x is west (the mirror image), y toward the south pole, δ measured toward it', () => {
    const latDeg = -33.9;
    const f = dialFrame({ latitudeDeg: latDeg });
    const H = -40 * DEG;
    const d = 15 * DEG; // north declination = −15° toward the elevated (south) pole
    const s = toDialFrame(f, enu(H, d, latDeg * DEG));
    expect(s[0]).toBeCloseTo(Math.cos(d) * Math.sin(H), 12); // −(east component)
    expect(s[1]).toBeCloseTo(-Math.sin(d), 12);
    expect(s[2]).toBeCloseTo(Math.cos(d) * Math.cos(H), 12);
  });

  test('right-handed and orthonormal with installation errors', () => {
    const f = dialFrame({ latitudeDeg: 40, tiltErrorDeg: 2.5, azimuthErrorDeg: -7 });
    const dot = (a: readonly number[], b: readonly number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    expect(dot(f.x, f.x)).toBeCloseTo(1, 14);
    expect(dot(f.x, f.y)).toBeCloseTo(0, 14);
    expect(dot(f.y, f.z)).toBeCloseTo(0, 14);
    const cz = [f.x[1] * f.y[2] - f.x[2] * f.y[1], f.x[2] * f.y[0] - f.x[0] * f.y[2], f.x[0] * f.y[1] - f.x[1] * f.y[0]];
    for (let k = 0; k < 3; k++) expect(cz[k]).toBeCloseTo(f.z[k], 14);
    expect(Math.asin(f.y[2]) / DEG).toBeCloseTo(42.5, 12); // the style rises at |latitude| + tilt error
    expect(Math.atan2(f.y[0], f.y[1]) / DEG).toBeCloseTo(-7, 12); // and points 7° west of north
  });
});
