/** A point in the face frame (DESIGN §2), mm: [x right-positive in the face drawing, y toward the elevated pole]. */
export type FacePoint = readonly [number, number];

/** An open polyline of face points, mm. */
export type FacePolyline = readonly FacePoint[];

/** Hemisphere of the site: decides which pole is elevated and where east lies on the face. */
export type Hemisphere = 'north' | 'south';
