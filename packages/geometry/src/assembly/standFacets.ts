import type { Vec3 } from '../parts/mesh.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import type { SizedStand } from '../stand/flatStand.ts';
import { placePoint } from '../stand/placeStandPart.ts';
import { sheetPartFacets, type PartFacet } from '../stand/sheetPartMesh.ts';
import type { PartPlacement, StandInstance } from '../stand/standTypes.ts';
import type { SheetPart } from '../sheet/sheetPart.ts';

/** Sides of the prisms standing for screw heads, nuts and anchors in the pictures. */
const FIXING_SIDES = 12;

/** A closed n-gon prism on a placement's plane: centre (x, y), radius, from depth w0 to w1 along its normal. */
function prism(pl: PartPlacement, [x, y]: readonly [number, number], radiusMm: number, w0: number, w1: number, sides = FIXING_SIDES): PartFacet[] {
  const ring = Array.from({ length: sides }, (_, k) => [x + radiusMm * Math.cos((2 * Math.PI * k) / sides), y + radiusMm * Math.sin((2 * Math.PI * k) / sides)] as const);
  const at = ([u, v]: readonly [number, number], w: number) => placePoint(pl, [u, v, w]);
  const lift = (d: Vec3, s: number): Vec3 => [d[0] * s, d[1] * s, d[2] * s];
  const out: PartFacet[] = [
    { points: ring.map((p) => at(p, w1)), normal: lift(pl.normal, 1) },
    { points: [...ring].reverse().map((p) => at(p, w0)), normal: lift(pl.normal, -1) },
  ];
  ring.forEach((p, k) => {
    const q = ring[(k + 1) % sides];
    const mid = (2 * k + 1) * Math.PI / sides;
    const n: Vec3 = [0, 1, 2].map((i) => pl.e1[i] * Math.cos(mid) + pl.e2[i] * Math.sin(mid)) as unknown as Vec3;
    out.push({ points: [at(p, w0), at(q, w0), at(q, w1), at(p, w1)], normal: n });
  });
  return out;
}

/** Every face of every flat part at its placement (16 segments a hole), in the placements' frame. */
export function placedPartFacets(parts: readonly SheetPart[], instances: readonly StandInstance[]): PartFacet[] {
  const out: PartFacet[] = [];
  const byName = new Map(parts.map((p) => [p.name, sheetPartFacets(p, 16)]));
  for (const inst of instances) {
    const facets = byName.get(inst.part) ?? [];
    const pl = inst.placement;
    for (const f of facets) {
      out.push({ points: f.points.map((p) => placePoint(pl, p)), normal: [0, 1, 2].map((i) => pl.e1[i] * f.normal[0] + pl.e2[i] * f.normal[1] + pl.normal[i] * f.normal[2]) as unknown as Vec3 });
    }
  }
  return out;
}

/**
 * The flat-pack stand as drawn in the pictures and the page (stand frame):
 * every part's faces at its placement, the ground anchors (a stud and nut
 * on each foot hole), and the plate's fixings (a screw head on the face over
 * each hole, a washer and nut under its seat rail), all at the places
 * `mountingFixings` gives through the seat.
 */
export function standFacets(layout: DialLayout, stand: SizedStand): { stand: PartFacet[]; fixings: PartFacet[] } {
  const out: PartFacet[] = placedPartFacets(stand.parts, stand.instances);
  const T = stand.dims.thicknessMm;
  const z = stand.sizing;
  if (z.anchor) {
    for (const id of ['foot-front', 'foot-rear']) {
      const inst = stand.instances.find((i) => i.id === id)!;
      const part = stand.parts.find((p) => p.name === inst.part)!;
      for (const h of part.inner) if (h.kind === 'circle') out.push(...prism(inst.placement, [h.cx, h.cy], z.anchor.washerOdMm * 0.45, T / 2, T / 2 + z.anchor.nutHeightMm, 6));
    }
  }
  const fixings: PartFacet[] = [];
  const s = z.screw;
  if (s) {
    const seat = stand.seat;
    const Tp = z.plateThicknessMm;
    for (const h of layout.plate.holes) {
      fixings.push(...prism(seat, [h.cx, h.cy], s.washerOdMm * 0.45, Tp, Tp + s.nutHeightMm * 0.55));
      out.push(...prism(seat, [h.cx, h.cy], s.washerOdMm * 0.45, -T - s.washerMm - s.nutHeightMm, -T, 6));
    }
  }
  return { stand: out, fixings };
}
