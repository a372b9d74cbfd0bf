import { defaultPictureDate, planarPictureSun, viewPlanarAssembly, type DialSpec, type PlanarLayout, type PlanarMounting, type PlateDrawing } from '@umbrafab/geometry';
import { fitPixelBudget, toAssemblySvg, toPngAsync, MAX_PICTURE_PIXELS } from '@umbrafab/fabricate';
import { assemblyPictureFields, type AssemblyPictureSection } from './picturesOutputs.ts';
import { utf8 } from './outputTypes.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';

/** report.json `pictures` of a planar face: the assembly picture as rendered. */
export interface PlanarPicturesSection {
  /** PNG resolution asked for (pictures.pxPerMm), pixels per mm */
  readonly pxPerMm: number;
  /** present only when assembly.png was rendered at less than pxPerMm: the pixel budget of one picture */
  readonly maxPixels?: number;
  /** assembly.svg / assembly.png: the face as it stands, with the gnomon's shadow at pictures.date / pictures.time */
  readonly assembly: AssemblyPictureSection & {
    /** what the face stands on in the picture: 'pillar' (horizontal), 'wall' (on its mount), 'stand' (equatorial) */
    readonly mounting: PlanarMounting;
    /** where the whole dial's shadow falls: 'ground' or 'wall' */
    readonly shadowOn: 'ground' | 'wall';
    /** pictures.viewAzimuth as asked: the viewer turned that far from the face's front, toward the side away from the sun (so the shadow shows), degrees */
    readonly viewAzimuthDeg: number;
    readonly viewElevationDeg: number;
    /** where the viewer stands as drawn: azimuth from true north toward the east, degrees 0..360 */
    readonly viewerAzimuthDeg: number;
  };
}

const MOUNTING_WORDS: Readonly<Record<PlanarMounting, string>> = { pillar: 'on its pillar', wall: 'on its wall mount', stand: 'on its stand' };

/**
 * assembly.svg and assembly.png of a horizontal, wall, meridian or
 * equatorial face (`viewPlanarAssembly`, drawn by the polar picture's
 * writer `toAssemblySvg`), held to MAX_PICTURE_PIXELS as the polar one,
 * and the report's `pictures` section. Nothing when the face has no
 * placement (an equatorial face beyond its stand's latitudes).
 */
export async function planarPictureFiles(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing): Promise<{ files: OutputFile[]; report?: PlanarPicturesSection; notes: string[] }> {
  const pics = spec.pictures;
  const ppm = pics.pxPerMm;
  const date = pics.date ?? defaultPictureDate(layout);
  const { sun, note: timeNote } = planarPictureSun(layout, date, pics.time);
  const picture = viewPlanarAssembly(layout, drawing, sun, { viewAzimuthDeg: pics.viewAzimuth, viewElevationDeg: pics.viewElevation });
  if (!picture) return { files: [], notes: [] };
  const mounting = picture.assembly.mounting;
  const svg = toAssemblySvg(picture, { title: `${spec.name}, ${layout.faceType} face ${MOUNTING_WORDS[mounting]}, ${date}, shadow on ${sun.dialTime}` });
  const v = picture.view.toViewer;
  const fit = fitPixelBudget(picture.widthMm, picture.heightMm, ppm);
  const png = await toPngAsync(svg, { pxPerMm: fit.pxPerMm });
  const notes = [
    ...(timeNote ? [timeNote] : []),
    ...(fit.lowered ? [`pictures: assembly.png at ${fit.pxPerMm} px/mm instead of pictures.pxPerMm ${ppm}, to stay within ${MAX_PICTURE_PIXELS / 1e6} million pixels a picture`] : []),
  ];
  return {
    files: [
      { name: 'assembly.svg', bytes: utf8(svg) },
      { name: 'assembly.png', bytes: png },
    ],
    notes,
    report: {
      pxPerMm: ppm,
      ...(fit.lowered ? { maxPixels: MAX_PICTURE_PIXELS } : {}),
      assembly: {
        ...assemblyPictureFields(picture, png, fit, date, sun),
        mounting,
        shadowOn: picture.assembly.backdrop.kind,
        viewAzimuthDeg: pics.viewAzimuth,
        viewElevationDeg: pics.viewElevation,
        viewerAzimuthDeg: Math.round(((Math.atan2(v[0], v[1]) * 180) / Math.PI + 360) % 360 * 1000) / 1000,
      },
    },
  };
}
