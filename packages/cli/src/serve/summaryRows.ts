import { countMarks, markCountText, type DialLayout, type PlanarLayout } from '@umbrafab/geometry';

/** One line of the page's numbers panel: already formatted, nothing left to compute in the browser. */
export interface SummaryRow {
  readonly key: string;
  readonly label: string;
  readonly value: string;
}

const mm = (v: number) => `${Number(v.toFixed(2))} mm`;

/**
 * The key numbers of a build, read from its layout (the same values
 * report.json carries): plate size, gnomon, tilt, the 45° check line, time
 * correction, mark count.
 */
export function summaryRows(layout: DialLayout): SummaryRow[] {
  const { plate, gnomon, time, spec } = layout;
  const at = (label: string) => layout.marks.filter((m) => m.label === label);
  const rows: SummaryRow[] = [
    { key: 'plate', label: 'plate', value: `${mm(plate.widthMm)} × ${mm(plate.lengthMm)} × ${mm(plate.thicknessMm)}` },
    { key: 'gnomon', label: 'gnomon height × thickness', value: `${mm(gnomon.heightMm)} × ${mm(gnomon.thicknessMm)}` },
    { key: 'style', label: 'style length', value: mm(gnomon.y1Mm - gnomon.y0Mm) },
    { key: 'tilt', label: 'plate tilt (wedge angle)', value: `${Number(Math.abs(spec.site.latitude).toFixed(3))}°` },
    { key: 'hemisphere', label: 'hemisphere', value: layout.hemisphere },
  ];
  for (const label of ['09:00', '15:00']) {
    const m = at(label)[0];
    if (m) rows.push({ key: `mark${label.slice(0, 2)}`, label: `${label} line from the style centre`, value: `${mm(m.xMm)} (hour angle ${Number(m.hourAngleDeg.toFixed(3))}°)` });
  }
  rows.push(
    { key: 'marks', label: 'marks', value: markCountText(countMarks(layout.marks)) },
    { key: 'reads', label: 'reads', value: time.reads === 'solar' ? 'apparent solar time' : 'standard time' },
    { key: 'meridian', label: 'standard meridian', value: `${time.standardMeridianDeg}°` },
    { key: 'longitudeCorrection', label: 'longitude correction', value: `${Number(time.longitudeCorrectionMin.toFixed(2))} min` },
    { key: 'cut', label: 'process', value: `${spec.process.method}, kerf ${spec.process.kerf} mm` },
  );
  return rows;
}

/**
 * The key numbers of a horizontal, wall, meridian or equatorial face, read
 * from its layout (the values its report.json carries): face, style height,
 * plate, gnomon, mark count, time correction.
 */
export function planarSummaryRows(layout: PlanarLayout): SummaryRow[] {
  const { plate, gnomon, time, spec } = layout;
  const f = spec.face!;
  const orientation =
    layout.faceType === 'vertical' ? `, declination ${f.wallDeclination}°${f.reclination ? `, reclination ${f.reclination}°` : ''}` : layout.faceType === 'meridian' ? `, facing ${f.facing}` : layout.faceType === 'equatorial' ? `, ${f.side} side` : '';
  return [
    { key: 'face', label: 'face', value: `${layout.faceType}${orientation}` },
    { key: 'styleHeight', label: 'style height over the face', value: `${Number(gnomon.styleHeightDeg.toFixed(3))}°` },
    { key: 'substyle', label: 'substyle hour angle', value: `${Number(layout.substyleHourAngleDeg.toFixed(3))}°` },
    { key: 'plate', label: 'plate', value: `${mm(plate.widthMm)} × ${mm(plate.lengthMm)} × ${mm(plate.thicknessMm)}` },
    { key: 'gnomon', label: `gnomon (${gnomon.kind}) height × thickness`, value: `${mm(gnomon.heightMm)} × ${mm(gnomon.thicknessMm)}` },
    { key: 'hemisphere', label: 'hemisphere', value: layout.hemisphere },
    { key: 'marks', label: 'marks', value: markCountText(countMarks(layout.marks)) },
    ...(layout.leftOut.length ? [{ key: 'leftOut', label: 'hours left out', value: layout.leftOut.map((h) => h.label).join(', ') }] : []),
    { key: 'reads', label: 'reads', value: time.reads === 'solar' ? 'apparent solar time' : 'standard time' },
    { key: 'meridian', label: 'standard meridian', value: `${time.standardMeridianDeg}°` },
    { key: 'longitudeCorrection', label: 'longitude correction', value: `${Number(time.longitudeCorrectionMin.toFixed(2))} min` },
    { key: 'cut', label: 'process', value: `${spec.process.method}, kerf ${spec.process.kerf} mm` },
  ];
}
