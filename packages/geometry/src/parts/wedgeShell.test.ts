import { describe, expect, it } from 'vitest';
import { meshVolumeMm3 } from './meshVolumeMm3.ts';
import { validateMesh } from './validateMesh.ts';
import { wedgeShell } from './wedgeShell.ts';
import { wedgeSolid } from './wedgeSolid.ts';

describe('wedgeShell', () => {
  const wedge = wedgeSolid({ latitudeDeg: 45, seatWidthMm: 150, seatLengthMm: 120 });

  it('wall 0 leaves the solid wedge unchanged in volume', async () => {
    const s = await wedgeShell(wedge, { wallMm: 0 });
    // Within float32 rounding of the corners (manifold-3d keeps float32 positions).
    expect(Math.abs(s.volumeMm3 - meshVolumeMm3(wedge.mesh))).toBeLessThan(1e-6 * s.volumeMm3);
    expect(s.cells).toBe(0);
  });

  it('hollows the wedge with ribs ≤ the spacing apart, one drain per cell, one closed shell', async () => {
    const s = await wedgeShell(wedge, { wallMm: 3, ribSpacingMm: 40 });
    validateMesh(s.mesh);
    // 150 mm seat: 144 mm inside the side walls: four cells of 33.75 mm between three 3 mm ribs.
    expect(s.ribXsMm.length).toBe(3);
    expect(s.cells).toBe(4);
    expect(s.drainHoles.length).toBe(4);
    expect(s.savingFraction).toBeGreaterThan(0.4);
    expect(s.savingFraction).toBeLessThan(0.9);
    // A thicker wall saves less.
    const thick = await wedgeShell(wedge, { wallMm: 6, ribSpacingMm: 40 });
    expect(thick.volumeMm3).toBeGreaterThan(s.volumeMm3);
    console.log(`45° wedge 150 × 120 mm seat: solid ${(s.solidVolumeMm3 / 1000).toFixed(1)} cm³, 3 mm shell ${(s.volumeMm3 / 1000).toFixed(1)} cm³ (saving ${(100 * s.savingFraction).toFixed(1)} %), 6 mm shell ${(thick.volumeMm3 / 1000).toFixed(1)} cm³`);
  });

  it('keeps a solid band unhollowed', async () => {
    const plain = await wedgeShell(wedge, { wallMm: 3, ribSpacingMm: 200 });
    const banded = await wedgeShell(wedge, { wallMm: 3, ribSpacingMm: 200, solidBands: [{ axis: 'x', fromMm: -10, toMm: 10 }] });
    expect(banded.volumeMm3).toBeGreaterThan(plain.volumeMm3);
    expect(banded.cells).toBe(2);
  });
});
