import { dialFrame, shadowOnFace, toDialFrame, type DialLayout, type Vec2, type Vec3 } from '@umbrafab/geometry';

/**
 * The two geometry calls the page's sun needs, in one place: the sun's
 * direction (world, X east, Y north, Z up) in the face frame of the dial as
 * installed (`dialFrame`, `toDialFrame`), and the gnomon's shadow on the face
 * (`shadowOnFace`, the code `umbrafab check` uses).
 */
export function sunInFaceFrame(layout: DialLayout, enu: Vec3): Vec3 {
  return toDialFrame(dialFrame({ latitudeDeg: layout.spec.site.latitude }), enu);
}

/** The gnomon's shadow on the face plane, face coordinates (mm), one closed polygon per piece. */
export function faceShadowPolygons(layout: DialLayout, sunFace: Vec3): Vec2[][] {
  return shadowOnFace(layout, sunFace).map((p) => [...p.points]);
}
