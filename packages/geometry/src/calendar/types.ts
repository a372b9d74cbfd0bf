import type { Vec2 } from '../types.ts';

export type { Hemisphere, StyleEdge } from '../types.ts';

/** A point in the face frame (docs/design.md §2, see ../types.ts), mm: [x right-positive in the face drawing, y toward the elevated pole]. */
export type FacePoint = Vec2;

/** An open polyline of face points, mm. */
export type FacePolyline = readonly FacePoint[];
