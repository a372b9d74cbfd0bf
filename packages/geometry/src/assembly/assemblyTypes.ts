import type { Vec2 } from '../types.ts';
import type { Vec3 } from '../parts/mesh.ts';

/**
 * Plain-data types of the assembly picture.
 *
 * World frame: X east, Y north, Z up (the ground is Z = 0), mm. The face
 * frame of docs/design.md §2 (x across, y toward the elevated pole, z the outward
 * normal) sits on the plate's top face; `FaceFrame` gives its axes in world
 * coordinates.
 */

/** One flat face of a part, world coordinates, with its outward unit normal. */
export interface Facet {
  readonly points: readonly Vec3[];
  readonly normal: Vec3;
}

/** The parts of the pictures: the polar dial's wedge or stand; a horizontal dial's pillar; a wall dial's wall and mount; every dial's plate, fixings and gnomon. */
export type AssemblyPartName = 'wedge' | 'stand' | 'pillar' | 'wall' | 'mount' | 'plate' | 'fixings' | 'gnomon';

/** A part placed in the world: its flat faces (triangles or polygons). */
export interface PlacedPart {
  readonly name: AssemblyPartName;
  readonly facets: readonly Facet[];
}

/** The dial face frame in world coordinates: p = origin + x·xAxis + y·yAxis + z·normal. */
export interface FaceFrame {
  readonly origin: Vec3;
  readonly xAxis: Vec3;
  readonly yAxis: Vec3;
  readonly normal: Vec3;
}

/** One thing to paint in the picture, picture mm (x right, y down), in painter's order. */
export type PictureItem =
  | {
      readonly kind: 'ground';
      readonly polygon: readonly Vec2[];
    }
  | {
      /** the wall behind a wall dial (the plane its shadow falls on): `shade` as a face's */
      readonly kind: 'wall';
      readonly shade: number;
      readonly polygon: readonly Vec2[];
    }
  | {
      /** a flat face of a part: `shade` is the lit fraction 0..1 (ambient + Lambert from the sun) */
      readonly kind: 'face';
      readonly part: AssemblyPartName;
      readonly shade: number;
      /** one face may be made of several coplanar triangles: paint them as one path */
      readonly polygons: readonly (readonly Vec2[])[];
    }
  | {
      readonly kind: 'shadow';
      readonly on: 'ground' | 'wall' | 'face';
      readonly polygons: readonly (readonly Vec2[])[];
    }
  | {
      /** a mark, hole or slot on the face: filled polygon */
      readonly kind: 'engraving';
      readonly role: 'mark' | 'hole' | 'slot';
      readonly label: string;
      readonly polygon: readonly Vec2[];
    }
  | {
      /** single-stroke text on the face, stroke width already foreshortened, picture mm */
      readonly kind: 'stroke';
      readonly role: 'numeral' | 'title' | 'label';
      readonly widthMm: number;
      readonly points: readonly Vec2[];
    };

/** The orthographic view: picture = [p·right − left, top − p·up], picture mm. */
export interface AssemblyView {
  /** unit vector from the dial toward the viewer */
  readonly toViewer: Vec3;
  readonly right: Vec3;
  readonly up: Vec3;
  readonly left: number;
  readonly top: number;
}
