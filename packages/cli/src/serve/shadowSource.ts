import { dialFrame, planarFaceVector, planarShadowOnFace, shadowOnFace, toDialFrame, type DialLayout, type PlanarLayout, type Vec2, type Vec3 } from '@umbrafab/geometry';

/** The layouts the page's sun is drawn on: the polar plate's, or a horizontal, wall, meridian or equatorial face's. */
export type SunLayout = DialLayout | PlanarLayout;

const isPlanar = (layout: SunLayout): layout is PlanarLayout => 'kind' in layout && layout.kind === 'planar';

/**
 * The two geometry calls the page's sun needs, in one place: the sun's
 * direction (world, X east, Y north, Z up) in the face frame of the dial as
 * installed (`dialFrame`, `toDialFrame` for the polar plate;
 * `planarFaceVector` for the other faces), and the gnomon's shadow on the
 * face (`shadowOnFace`, the code `umbrafab check` uses; `planarShadowOnFace`).
 */
export function sunInFaceFrame(layout: SunLayout, enu: Vec3): Vec3 {
  if (isPlanar(layout)) return planarFaceVector(layout, enu);
  return toDialFrame(dialFrame({ latitudeDeg: layout.spec.site.latitude }), enu);
}

/** The gnomon's shadow on the face plane, face coordinates (mm), one closed polygon per piece. */
export function faceShadowPolygons(layout: SunLayout, sunFace: Vec3): Vec2[][] {
  return (isPlanar(layout) ? planarShadowOnFace(layout, sunFace) : shadowOnFace(layout, sunFace)).map((p) => [...p.points]);
}
