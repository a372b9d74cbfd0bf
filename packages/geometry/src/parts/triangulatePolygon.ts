import type { Triangle, Vec2 } from './mesh.ts';

/**
 * Triangulate a simple polygon, optionally with holes, by ear clipping,
 * without adding any vertex: n corners in total and h holes give exactly
 * n + 2h − 2 triangles.
 *
 * Method: D. Eberly, "Triangulation by Ear Clipping", Geometric Tools
 * (2002, rev. 2015), https://www.geometrictools.com/Documentation/TriangulationByEarClipping.pdf
 * — holes are joined to the outer ring by a bridge from each hole's
 * right-most vertex to a visible ring vertex found with a +u ray (§3),
 * then ears are clipped (§2). Adapted: among all current ears the best-shaped
 * one (largest area / sum of squared edges) is clipped first, ties going to
 * the lowest ring position, so the result is deterministic and avoids needless
 * slivers.
 *
 * @param outer outer boundary, either orientation, no repeated closing point
 * @param holes hole boundaries, either orientation, strictly inside `outer`
 *   and disjoint from each other
 * @returns index triples into `[...outer, ...holes[0], ...holes[1], …]`,
 *   every triangle counter-clockwise (positive area) in the (u, v) plane
 * @example triangulatePolygon([[0,0],[2,0],[2,2],[0,2]]) // [[…], […]] two triangles
 */
export function triangulatePolygon(outer: readonly Vec2[], holes: readonly (readonly Vec2[])[] = []): Triangle[] {
  if (outer.length < 3) throw new Error(`triangulatePolygon: outer has ${outer.length} points; at least 3 are needed`);
  const pts: Vec2[] = [...outer];
  holes.forEach((h, hi) => {
    if (h.length < 3) throw new Error(`triangulatePolygon: holes[${hi}] has ${h.length} points; at least 3 are needed`);
    pts.push(...h);
  });
  pts.forEach((p, i) => {
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1])) {
      throw new Error(`triangulatePolygon: point ${i} = [${p.join(', ')}] is not finite`);
    }
  });

  // Outer ring counter-clockwise, hole rings clockwise.
  let ring = outer.map((_, i) => i);
  if (ringArea(pts, ring) < 0) ring.reverse();
  const holeRings: number[][] = [];
  let base = outer.length;
  for (const h of holes) {
    const r = h.map((_, i) => base + i);
    if (ringArea(pts, r) > 0) r.reverse();
    holeRings.push(r);
    base += h.length;
  }

  // Bridge holes in order of decreasing right-most u (Eberly §3).
  const order = holeRings
    .map((r, hi) => ({ r, hi, maxU: Math.max(...r.map((i) => pts[i][0])) }))
    .sort((a, b) => b.maxU - a.maxU || a.hi - b.hi);
  for (const { r } of order) ring = bridgeHole(pts, ring, r);

  return clipEars(pts, ring);
}

/** Twice the signed area of a ring (shoelace formula), positive if CCW. */
function ringArea(pts: readonly Vec2[], ring: readonly number[]): number {
  let s = 0;
  for (let k = 0; k < ring.length; k++) {
    const a = pts[ring[k]];
    const b = pts[ring[(k + 1) % ring.length]];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s;
}

/** Twice the signed area of triangle (a, b, c). */
function orient(a: Vec2, b: Vec2, c: Vec2): number {
  return (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
}

function samePoint(a: Vec2, b: Vec2): boolean {
  return a[0] === b[0] && a[1] === b[1];
}

/** Is q inside or on the CCW triangle (a, b, c)? */
function inTriangle(a: Vec2, b: Vec2, c: Vec2, q: Vec2): boolean {
  return orient(a, b, q) >= 0 && orient(b, c, q) >= 0 && orient(c, a, q) >= 0;
}

/** Is q strictly inside the interior angle of the ring at p (between prev→p→next)? */
function inSector(prev: Vec2, p: Vec2, next: Vec2, q: Vec2): boolean {
  const convex = orient(prev, p, next) > 0;
  const leftIn = orient(prev, p, q) > 0;
  const leftOut = orient(p, next, q) > 0;
  return convex ? leftIn && leftOut : leftIn || leftOut;
}

/** Join one clockwise hole ring into the counter-clockwise ring through a visible vertex. */
function bridgeHole(pts: readonly Vec2[], ring: readonly number[], hole: readonly number[]): number[] {
  // Right-most hole vertex M (ties: lowest v, then first).
  let mPos = 0;
  hole.forEach((idx, k) => {
    const p = pts[idx];
    const best = pts[hole[mPos]];
    if (p[0] > best[0] || (p[0] === best[0] && p[1] < best[1])) mPos = k;
  });
  const M = pts[hole[mPos]];

  // Nearest crossing of the ray M + s·(1, 0), s ≥ 0, with an upward ring edge.
  let bestU = Infinity;
  let hitPos = -1; // ring position of the chosen candidate vertex P
  for (let k = 0; k < ring.length; k++) {
    const a = pts[ring[k]];
    const b = pts[ring[(k + 1) % ring.length]];
    if (!(a[1] <= M[1] && M[1] <= b[1] && a[1] < b[1])) continue;
    const u = a[0] + ((M[1] - a[1]) * (b[0] - a[0])) / (b[1] - a[1]);
    if (u < M[0] || u >= bestU) continue;
    bestU = u;
    if (u === a[0] && M[1] === a[1]) hitPos = k;
    else if (u === b[0] && M[1] === b[1]) hitPos = (k + 1) % ring.length;
    else hitPos = a[0] > b[0] ? k : (k + 1) % ring.length;
  }
  if (hitPos < 0) throw new Error('triangulatePolygon: a hole is not inside the outer boundary');
  const I: Vec2 = [bestU, M[1]];
  let P = pts[ring[hitPos]];

  // If P is not the exact hit, a reflex ring vertex inside triangle (M, I, P)
  // may hide it: take the one with the smallest angle to the ray, then the nearest.
  if (!samePoint(P, I)) {
    const tri: [Vec2, Vec2, Vec2] = orient(M, I, P) > 0 ? [M, I, P] : [M, P, I];
    let bestAngle = Infinity;
    let bestDist = Infinity;
    let choice = hitPos;
    for (let k = 0; k < ring.length; k++) {
      const q = pts[ring[k]];
      const prev = pts[ring[(k - 1 + ring.length) % ring.length]];
      const next = pts[ring[(k + 1) % ring.length]];
      if (k === hitPos || samePoint(q, M)) continue;
      if (orient(prev, q, next) > 0) continue; // convex: cannot hide P
      if (!inTriangle(tri[0], tri[1], tri[2], q)) continue;
      const dx = q[0] - M[0];
      const dy = q[1] - M[1];
      const dist = Math.hypot(dx, dy);
      const angle = Math.abs(Math.atan2(dy, dx));
      if (angle < bestAngle || (angle === bestAngle && dist < bestDist)) {
        bestAngle = angle;
        bestDist = dist;
        choice = k;
      }
    }
    hitPos = choice;
    P = pts[ring[hitPos]];
  }

  // A vertex reached by an earlier bridge appears twice: pick the copy whose
  // interior angle contains the direction toward M.
  const copies: number[] = [];
  ring.forEach((idx, k) => {
    if (samePoint(pts[idx], P)) copies.push(k);
  });
  if (copies.length > 1) {
    const fit = copies.find((k) =>
      inSector(pts[ring[(k - 1 + ring.length) % ring.length]], P, pts[ring[(k + 1) % ring.length]], M),
    );
    if (fit !== undefined) hitPos = fit;
  }

  const holeFromM = [...hole.slice(mPos), ...hole.slice(0, mPos)];
  return [
    ...ring.slice(0, hitPos + 1),
    ...holeFromM,
    hole[mPos],
    ring[hitPos],
    ...ring.slice(hitPos + 1),
  ];
}

/** Clip ears from a (weakly) simple CCW ring until one triangle is left. */
function clipEars(pts: readonly Vec2[], start: readonly number[]): Triangle[] {
  const ring = [...start];
  const out: Triangle[] = [];
  while (ring.length > 3) {
    let bestPos = -1;
    let bestScore = -Infinity;
    for (let k = 0; k < ring.length; k++) {
      const ia = ring[(k - 1 + ring.length) % ring.length];
      const ib = ring[k];
      const ic = ring[(k + 1) % ring.length];
      const a = pts[ia];
      const b = pts[ib];
      const c = pts[ic];
      const area2 = orient(a, b, c);
      const e2 =
        (b[0] - a[0]) ** 2 + (b[1] - a[1]) ** 2 + (c[0] - b[0]) ** 2 + (c[1] - b[1]) ** 2 + (a[0] - c[0]) ** 2 + (a[1] - c[1]) ** 2;
      if (!(area2 > 1e-12 * e2)) continue; // reflex or flat corner: not an ear
      const score = area2 / e2;
      if (score <= bestScore) continue;
      let blocked = false;
      for (let m = 0; m < ring.length && !blocked; m++) {
        const q = pts[ring[m]];
        if (samePoint(q, a) || samePoint(q, b) || samePoint(q, c)) continue;
        blocked = inTriangle(a, b, c, q);
      }
      if (blocked) continue;
      bestScore = score;
      bestPos = k;
    }
    if (bestPos < 0) throw new Error(`triangulatePolygon: no ear found among ${ring.length} corners (polygon not simple?)`);
    const k = bestPos;
    out.push([ring[(k - 1 + ring.length) % ring.length], ring[k], ring[(k + 1) % ring.length]]);
    ring.splice(k, 1);
  }
  const [a, b, c] = ring;
  if (!(orient(pts[a], pts[b], pts[c]) > 0)) throw new Error('triangulatePolygon: the last triangle is flat (polygon not simple?)');
  out.push([a, b, c]);
  return out;
}
