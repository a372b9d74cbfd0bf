import {
  layoutPlanar,
  mapMesh,
  meshBounds,
  planarGnomonSolid,
  pillarFixing,
  planarInstallSheet,
  planarPlateDrawing,
  standSolid,
  wallMount,
  WALL_ANCHOR_HOLE_MM,
  validateMesh,
  plateSheetPart,
  finSheetPart,
  reliefToolRadius,
  type DialSpec,
  type PlanarLayout,
  type PlateDrawing,
  LOWER_FACE_STAND_NOTE,
} from '@umbrafab/geometry';
import { assertToolFits, engraveFromSpec, engraveProgramsFor, stlHeader, toPlanarInstallMd, toPngAsync, toReportJson, toStl, toSvg, twoFaceEngraving } from '@umbrafab/fabricate';
import { cutPartFiles } from './outputs/cutParts.ts';
import { planarStandFiles } from './outputs/planarStandOutputs.ts';
import { utf8 } from './outputs/outputTypes.ts';
import { stlFigures } from './outputs/meshFigures.ts';
import { planarExtraOutputs } from './outputs/planarExtras.ts';
import { planarPictureFiles } from './outputs/planarPictures.ts';
import type { PlanarReport, WallMountSection } from './outputs/planarReport.ts';
import { planarPreviewSvgOptions } from './planarViews.ts';
import type { EngraveWorker } from './engraveOnWorker.ts';
import { engraveBeside } from './engraveBeside.ts';
import type { OutputFile } from './writeFilesAtomic.ts';

/** What a planar build produces, in memory (the same shape as the polar `BuildResult`). */
export interface PlanarBuildResult {
  readonly layout: PlanarLayout;
  readonly drawing: PlateDrawing;
  readonly files: readonly OutputFile[];
  readonly report: PlanarReport;
}

/**
 * The files of a horizontal, wall, meridian or equatorial face, through the
 * same writers as the polar plate (plate.dxf, preview.svg, the engraving
 * programs read the one `PlateDrawing`); the gnomon (a fin as gnomon.dxf
 * for sheet work and gnomon.stl for printing, or an equatorial rod as
 * gnomon.stl); install.md; report.json. No wedge: these faces mount flat
 * on their wall, pillar or stand. Byte-identical run to run. With
 * `engraveWorker` the engraving programs are made on that thread meanwhile.
 */
export async function buildPlanarFiles(spec: DialSpec, generator: string, engraveWorker?: EngraveWorker): Promise<PlanarBuildResult> {
  const layout = layoutPlanar(spec);
  const drawing = planarPlateDrawing(layout);
  // Started now, taken in its place below (an earlier step's failure is still the one reported).
  const engraves = engraveProgramsFor(spec.engrave.programs, spec.process.method).length > 0;
  if (!engraves) engraveWorker?.close();
  // A plate engraved on both faces: one program set per side, the turn between them named in each header (side 1 on the worker, side 2 here).
  const sides = twoFaceEngraving(drawing);
  const onWorker = !engraves || !engraveWorker ? undefined : sides ? engraveWorker.engrave(spec, drawing, engraveFromSpec, sides.upper) : engraveBeside(engraveWorker, spec, drawing, engraveFromSpec);
  onWorker?.catch(() => undefined);
  const files: OutputFile[] = [];
  const part = planarGnomonSolid(layout);
  // The flat parts as cut (plate.dxf, gnomon.dxf): tool-fit check on the nominal parts, then relief for the tool.
  const cutFin = part.kind === 'fin' && spec.process.method !== 'print';
  const flatParts = (relief: number) => {
    const o = { material: spec.plate.material, thicknessMm: layout.plate.thicknessMm, reliefToolRadiusMm: relief, chordToleranceMm: spec.cutFiles.chordTolerance };
    return [plateSheetPart(drawing, o), ...(cutFin ? [finSheetPart(part.profile, { ...o, thicknessMm: part.thicknessMm })] : [])];
  };
  if (spec.process.method !== 'print') assertToolFits(flatParts(0), spec.process.kerf);
  const [platePart, finPart] = flatParts(reliefToolRadius(spec));
  const plateCut = await cutPartFiles({ spec, drawing }, platePart);
  files.push(...plateCut.files);
  const preview = toSvg(drawing, planarPreviewSvgOptions({ spec, layout }));
  files.push({ name: 'preview.svg', bytes: utf8(preview) });
  if (spec.pictures.write) files.push({ name: 'preview.png', bytes: await toPngAsync(preview, { pxPerMm: spec.pictures.pxPerMm }) });
  if (sides) {
    // The lower face as the shop sees it after the flip (the LINE_SCORE_LOWER and TEXT_ENGRAVE_LOWER layers), at 1:1.
    const lowerPreview = toSvg(sides.lowerDrawing, planarPreviewSvgOptions({ spec, layout }, true));
    files.push({ name: 'preview-lower.svg', bytes: utf8(lowerPreview) });
    if (spec.pictures.write) files.push({ name: 'preview-lower.png', bytes: await toPngAsync(lowerPreview, { pxPerMm: spec.pictures.pxPerMm }) });
  }
  const pictures = spec.pictures.write ? await planarPictureFiles(spec, layout, drawing) : { files: [], notes: [] };
  files.push(...pictures.files);
  const engraving = await (onWorker ?? engraveFromSpec(spec, drawing, sides?.upper));
  files.push(...engraving.files.map((f) => ({ name: f.name, bytes: utf8(f.text) })));
  const lowerEngraving = sides ? await engraveFromSpec(spec, sides.lowerDrawing, sides.lower) : undefined;
  if (lowerEngraving) files.push(...lowerEngraving.files.map((f) => ({ name: f.name, bytes: utf8(f.text) })));

  const b = meshBounds(part.mesh);
  // Laid flat for printing: the fin on its side (x → z), the rod on its end; +z up, min corner at the origin.
  const flat = validateMesh(part.kind === 'fin'
    ? mapMesh(part.mesh, ([x, y, z]) => [y - b.min[1], z - b.min[2], x - b.min[0]])
    : mapMesh(part.mesh, ([x, y, z]) => [x - b.min[0], y - b.min[1], z - b.min[2]]));
  files.push({ name: 'gnomon.stl', bytes: toStl(flat, { header: stlHeader([`umbrafab ${part.kind} for a ${layout.faceType} face, t=${part.thicknessMm} mm, style ${layout.gnomon.styleHeightDeg.toFixed(2)} deg`, spec.name]) }) });
  const finCut = finPart ? await cutPartFiles({ spec, drawing }, finPart) : undefined;
  if (finCut) files.push(...finCut.files);
  const mount = await wallMountFiles(spec, layout, drawing);
  files.push(...mount.files);
  const stand = await planarStandFiles(spec, layout);
  files.push(...stand.files);
  const extras = await planarExtraOutputs(spec, layout, drawing, part, [platePart, ...(finPart ? [finPart] : [])]);
  files.push(...extras.files);
  files.push({ name: 'install.md', bytes: utf8(toPlanarInstallMd(planarInstallSheet(layout), extras.templateGuide)) });

  const pillar = pillarFixing(layout);
  const names = [...files.map((f) => f.name), 'report.json'];
  const report: PlanarReport = {
    generator,
    spec,
    face: {
      type: layout.faceType,
      styleHeightDeg: layout.gnomon.styleHeightDeg,
      substyleHourAngleDeg: layout.substyleHourAngleDeg,
      plateTurnDeg: layout.plateTurnDeg,
      normalEnu: layout.face.normal,
    },
    hemisphere: layout.hemisphere,
    ...faceMarksSection(layout),
    ...(layout.lowerFace && lowerEngraving && drawing.lowerFace
      ? { lowerFace: { ...faceMarksSection(layout.lowerFace), normalEnu: layout.lowerFace.face.normal, flipAxisXMm: drawing.lowerFace.flipAxisX, engraving: lowerEngraving.report } }
      : {}),
    plate: {
      widthMm: layout.plate.widthMm,
      lengthMm: layout.plate.lengthMm,
      thicknessMm: layout.plate.thicknessMm,
      cornerRadiusMm: layout.plate.cornerRadiusMm,
      substyleX: layout.plate.substyleX,
      faceOriginY: layout.plate.faceOriginY,
      holes: layout.plate.holes.map((c) => ({ xMm: c.cx, yMm: c.cy, diameterMm: 2 * c.radiusMm })),
      slots: layout.plate.slots.map((s) => ({ xMm: s.cx, yMm: s.cy, widthMm: s.widthMm, lengthMm: s.heightMm })),
      cut: { method: spec.process.method, ...plateCut.report, fitClearancePerSideMm: spec.process.clearance },
    },
    gnomon: { ...layout.gnomon, profileAreaMm2: part.profileAreaMm2, belowFaceMm: part.belowFaceMm },
    ...(finCut ? { parts: { gnomonDxf: finCut.report } } : {}),
    ...(mount.report ? { mount: mount.report } : {}),
    ...(stand.report ? { stand: stand.report } : {}),
    ...(pillar ? { pillar } : {}),
    ...(pictures.report ? { pictures: pictures.report } : {}),
    ...extras.report,
    time: layout.time,
    engraving: engraving.report,
    notes: [...layout.notes, ...(layout.lowerFace && stand.report ? [LOWER_FACE_STAND_NOTE] : []), ...pictures.notes],
    files: names,
  };
  files.push({ name: 'report.json', bytes: utf8(toReportJson(report)) });
  return { layout, drawing, files, report };
}

/** A face's marks, the hours it leaves out and its curves, as report.json lists them. */
function faceMarksSection(layout: PlanarLayout): Pick<PlanarReport, 'marks' | 'leftOut' | 'curves'> {
  return {
    marks: layout.marks.map((m) => ({ label: m.label, kind: m.kind, hourAngleDeg: m.hourAngleDeg, edge: m.edge, x0Mm: m.a[0], y0Mm: m.a[1], x1Mm: m.b[0], y1Mm: m.b[1], widthMm: m.widthMm, ...(m.underGnomon ? { underGnomon: true as const } : {}) })),
    leftOut: layout.leftOut,
    curves: layout.curves.map((c) => ({ label: c.label, kind: c.kind, pieces: c.paths.length })),
  };
}

/**
 * A wall face's mounting plate (`wallMount`): mount.dxf for sheet work
 * (the nominal part through the same cut-file writer as plate.dxf, after
 * the tool-fit check) and mount.stl (flat, +z up, min corner at the
 * origin); its report section lists the fixings, anchors and fasteners.
 * Nothing for faces that do not hang on a wall.
 */
async function wallMountFiles(spec: DialSpec, layout: PlanarLayout, drawing: PlateDrawing): Promise<{ files: OutputFile[]; report?: WallMountSection }> {
  const m = wallMount(layout);
  if (!m) return { files: [] };
  const files: OutputFile[] = [];
  let cut: WallMountSection['files']['dxf'];
  if (spec.process.method !== 'print') {
    assertToolFits([m.part], spec.process.kerf);
    const c = await cutPartFiles({ spec, drawing }, m.part);
    files.push(...c.files);
    cut = { ...c.report };
  }
  const t = m.part.thicknessMm;
  const mesh = await standSolid({ parts: [m.part], instances: [{ id: 'mount', part: 'mount', placement: { origin: [0, 0, t / 2], e1: [1, 0, 0], e2: [0, 1, 0], normal: [0, 0, 1] } }] });
  files.push({ name: 'mount.stl', bytes: toStl(mesh, { header: stlHeader([`umbrafab wall mount for a ${layout.faceType} face, t=${t} mm, ${m.anchors.length} anchor holes`, spec.name]) }) });
  const [W, L] = [m.part.outer.points[2][0], m.part.outer.points[2][1]];
  return {
    files,
    report: {
      widthMm: W,
      lengthMm: L,
      thicknessMm: t,
      material: m.part.material,
      plateAtMm: m.plateAtMm,
      fixings: m.fixings,
      dialFixing: m.dialFixing,
      threadEngagementMm: m.threadEngagementMm,
      anchors: m.anchors.map(([x, y], i) => ({ index: i + 1, xMm: x, yMm: y, diameterMm: WALL_ANCHOR_HOLE_MM })),
      fasteners: m.fasteners,
      files: { ...(cut ? { dxf: cut } : {}), stl: stlFigures(mesh) },
    },
  };
}
