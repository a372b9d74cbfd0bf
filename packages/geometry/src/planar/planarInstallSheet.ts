import { INSTALL_CAUTIONS } from '../install/installSheet.ts';
import type { PlanarLayout } from './layoutPlanar.ts';
import { wallMount } from './wallMount.ts';
import { equatorialStand, equatorialStandApplies } from './equatorialStand.ts';
import type { FastenerRow } from '../stand/fastenerTable.ts';
import { equatorialStandSteps } from './equatorialStandSteps.ts';
import { pillarFixing } from './pillarFixing.ts';
import { compassSentence } from './compassSentence.ts';
import { jointFixing } from '../install/assemblyGuide.ts';

/** The installation sheet of a planar face: plain data, every length mm, angle degrees. */
export interface PlanarInstallSheet {
  readonly title: string;
  readonly faceType: PlanarLayout['faceType'];
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly styleHeightDeg: number;
  readonly substyleHourAngleDeg: number;
  /** the steps in order, plain sentences */
  readonly steps: readonly string[];
  readonly leftOut: readonly string[];
  /** what to buy to fix the face: its pillar studs, its wall mount's screws and anchors, or its stand's (empty when none is sized) */
  readonly fasteners: readonly FastenerRow[];
  readonly cautions: readonly string[];
}

/**
 * What a build of a plate engraved on both faces says of its stand: the
 * stand (cheeks, seat rails, hub) stands under the plate, on the lower
 * face's side, so it can shade that face. Measured on
 * fixtures/planar/equatorial-both.yaml by rays from the lower face's lines
 * toward the Sun at their hours (the ray test of test/equatorialStand.test.ts):
 * at the winter solstice the 07:30 and 16:30 lines, at declination −12° every
 * line from sunrise to 07:30 and from 16:30, near the equinoxes the outer
 * ends of most lines.
 */
export const LOWER_FACE_STAND_NOTE = "the stand stands under the lower face: its cheeks shade the lower face's lines near 6 o'clock when the winter Sun is low across the plate, and the outer ends of more lines in the weeks around the equinoxes";

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);

/**
 * How to set a horizontal, wall, meridian or equatorial face (common
 * practice): a level face is levelled and its substyle turned onto the true
 * meridian; a wall face is marked with a plumb line and a level — the root
 * (the fin's foot end) and the substyle's angle from the plumb line — then
 * fixed through its holes; a meridian face is plumbed and its style set
 * level-true at the latitude; an equatorial face is tilted to 90° − |φ| with
 * its rod on the celestial pole, on its stand (`equatorialStandSteps`) where one is built. Angles and lengths come from the layout.
 */
export function planarInstallSheet(layout: PlanarLayout): PlanarInstallSheet {
  const spec = layout.spec;
  const lat = spec.site.latitude;
  const pole = lat >= 0 ? 'north' : 'south';
  const eqWard = lat >= 0 ? 'south' : 'north';
  const psi = layout.gnomon.styleHeightDeg;
  const steps: string[] = [];
  const rootAt = `${f1(layout.plate.substyleX)} mm from the plate's left edge and ${f1(layout.plate.faceOriginY)} mm from its lower edge`;
  switch (layout.faceType) {
    case 'horizontal':
      steps.push(...horizontalSteps(layout, rootAt));
      break;
    case 'vertical': {
      const f = spec.face!;
      steps.push(
        `The wall's declination is ${f1(Math.abs(f.wallDeclination))}° ${f.wallDeclination >= 0 ? 'west' : 'east'} of due ${eqWard}${f.reclination ? `, the face leaning ${f.reclination > 0 ? 'back' : 'forward'} ${f1(Math.abs(f.reclination))}° from upright` : ''}; measure it again on the day (umbrafab wall) if the wall may differ from the spec.`,
        `Hang a plumb line where the dial goes and mark it on the wall with a pencil. Choose the root's point on that line: the root is the fin's sharp foot, at ${rootAt}.`,
        Math.abs(layout.plateTurnDeg) > 1e-9
          ? `The substyle is not plumb: mark it through the root at ${f2(Math.abs(layout.plateTurnDeg))}° from the plumb line, turned ${layout.plateTurnDeg > 0 ? 'clockwise' : 'anticlockwise'} seen from in front (set a bevel gauge or a digital level on the drawn line). The plate's long edges follow the substyle; its 'plumb line' reference line must lie on your pencil line.`
          : `The substyle is plumb: the plate's long edges stand vertical; check them with a level.`,
        ...mountSteps(layout, `Hold the plate on the marks, drill the fixings through its holes (wall plugs and stainless screws sized for the wall and the plate's weight), and fix it.`),
        `Fit the fin in its slots, square to the face: its style makes ${f2(psi)}° with the face and points at the celestial ${pole} pole.`,
      );
      break;
    }
    case 'meridian':
      steps.push(
        `The face looks due ${spec.face!.facing}: set it plumb (check both edges with a level) in the vertical plane of the true meridian.`,
        `The substyle (the plate's long axis) must rise toward the ${pole} at ${f2(Math.abs(lat))}° from the horizontal (the site's |latitude|): mark a level line through the plate's centre, then the substyle at that angle with a bevel gauge.`,
        ...mountSteps(layout, `Fix the plate through its holes.`),
        `Fit the fin: its style runs parallel to the face, ${f1(layout.gnomon.heightMm)} mm above it.`,
      );
      break;
    case 'equatorial':
      if (layout.lowerFace) steps.push(twoFaceStep(layout));
      if (equatorialStandApplies(layout)) {
        steps.push(...equatorialStandSteps(layout));
        break;
      }
      steps.push(
        spec.face!.side === 'both'
          ? `The plate lies square to the Earth's axis: tilt it ${f2(90 - Math.abs(lat))}° from the horizontal (90° − |latitude|), its upper face toward the celestial ${pole} pole, its lower face toward the ${eqWard}ern sky.`
          : `The plate lies square to the Earth's axis: tilt it ${f2(90 - Math.abs(lat))}° from the horizontal (90° − |latitude|), its ${spec.face!.side} face toward the ${spec.face!.side === 'upper' ? `celestial ${pole} pole` : `${eqWard}ern sky`}.`,
        `Turn it so the 12 line points straight down the slope, on the true meridian; the rod then points at the celestial ${pole} pole.`,
        `Push the rod (${f1(layout.gnomon.thicknessMm)} mm diameter) through the centre hole until ${f1(layout.gnomon.heightMm)} mm stands above each face; the rod's shadow is a band centred on the line.`,
      );
      break;
  }
  steps.push(
    spec.dial.reads === 'solar'
      ? 'The dial reads apparent solar time: add the equation of time and the longitude correction (report.json, time) to get clock time.'
      : `The lines are shifted for standard time at ${f2(layout.time.standardMeridianDeg)}° (longitude correction ${f1(layout.time.longitudeCorrectionMin)} min); add the equation of time (and an hour in summer time).`,
  );
  return {
    title: spec.name,
    faceType: layout.faceType,
    latitudeDeg: lat,
    longitudeDeg: spec.site.longitude,
    styleHeightDeg: psi,
    substyleHourAngleDeg: layout.substyleHourAngleDeg,
    steps,
    leftOut: layout.leftOut.map((l) => `${l.label}: ${l.reason}`),
    fasteners: faceFasteners(layout),
    cautions: INSTALL_CAUTIONS,
  };
}

/**
 * The plate engraved on both faces: which face is read when, and how the
 * shop makes it (side 1, the turn about the flip axis, side 2).
 */
function twoFaceStep(layout: PlanarLayout): string {
  const north = layout.spec.site.latitude >= 0;
  const lower = layout.lowerFace!;
  return `The plate is engraved on both faces. The upper face (toward the celestial ${north ? 'north' : 'south'} pole) is read from the ${north ? 'March to the September' : 'September to the March'} equinox, the lower face the other half of the year; around the equinoxes the Sun grazes both. Making it: cut the plate and engrave the upper face (plate.dxf's LINE_SCORE and TEXT_ENGRAVE layers, the programs without -lower), then turn the plate over about its flip axis, the vertical centre line through the rod hole (x = ${f1(layout.plate.widthMm / 2)} mm; left edge to right), and engrave the lower face (the _LOWER layers, the programs ending -lower) from the same corner: the outline and holes fall where they were. The lower face carries ${lower.marks.filter((m) => !m.underGnomon).length} lines, the upper ${layout.marks.filter((m) => !m.underGnomon).length}.${equatorialStandApplies(layout) ? ` Note: ${LOWER_FACE_STAND_NOTE}.` : ''}`;
}

/**
 * Fixing a wall face through its mounting plate (`wallMount`, mount.dxf /
 * mount.stl), or `direct` when the face has none: the mount's plumb line,
 * level line and substyle (reference layer) laid on the pencil marks, the
 * mount anchored through its rim, the plate screwed to its tapped holes or
 * through it into wall plugs (`MountDialFixing`).
 */
function mountSteps(layout: PlanarLayout, direct: string): string[] {
  const m = wallMount(layout);
  if (!m) return [direct];
  const [x, y] = m.plateAtMm;
  const [dial, wall] = m.fasteners;
  const tapped = m.dialFixing === 'tapped';
  const sits = `the dial plate sits on its drawn outline, its lower-left corner ${f1(x)} mm in from the mount's left edge and ${f1(y)} mm up from its lower edge, so its holes fall on the mount's`;
  return [
    tapped
      ? `Drill the mount's ${m.fixings.length} dial holes Ø ${m.fixings[0].mountHoleMm.toFixed(1)} mm (as cut) and tap them ${dial.size}; ${sits} tapped ones.`
      : `The mount's ${m.fixings.length} dial holes are clearance holes Ø ${m.fixings[0].mountHoleMm.toFixed(1)} mm like the plate's (a ${m.part.material} mount of ${f1(m.part.thicknessMm)} mm does not hold a thread well enough): the dial plate's screws go through both into wall plugs; ${sits}.`,
    `With the plumb line (plumb bob) and a level line (spirit level) through the root's point pencilled on the wall, hold the mount with its 'plumb line' and 'level line' reference lines on the pencil marks (transfer them to the mount's edges with a square first), check its 'plumb line' with the level once more, and mark the ${m.anchors.length} anchor holes through its rim.`,
    `Drill the wall and fix the mount through its ${wall.count} anchor holes: wall plugs and stainless screws with washers (timber: coach screws), ${wall.lengthMm} mm long as a first figure; the plug maker's data and the wall rule.`,
    tapped
      ? `Screw the dial plate to the mount with ${dial.count} ${dial.size} × ${dial.lengthMm} mm stainless pan-head screws (their tips stay inside the mount, ${f1(m.threadEngagementMm!)} mm of thread).`
      : `Drill the wall through the mount's ${dial.count} dial holes, set a wall plug in each, and screw the dial plate on with ${dial.count} stainless pan-head screws ${dial.lengthMm} mm long as a first figure (the plug maker's data and the wall rule).`,
  ];
}

/**
 * Setting a horizontal face on its pillar (common practice): fix the fin in
 * its slots first and square it; mark the true meridian on the pillar top
 * from a plumb line's noon shadow; lay the plate (or its 1:1 template sheet)
 * with the substyle on that mark and mark the holes; set the studs of
 * `pillarFixing` in resin; level the plate on nuts under it; nut it down.
 * Without corner holes the plate is bedded on the pillar instead.
 */
function horizontalSteps(layout: PlanarLayout, rootAt: string): string[] {
  const spec = layout.spec;
  const pole = spec.site.latitude >= 0 ? 'north' : 'south';
  const psi = f2(layout.gnomon.styleHeightDeg);
  const tabs = layout.gnomon.tabs.length;
  const steps = [
    tabs > 0
      ? `Fix the fin: push its ${tabs} tabs through the plate's slots from the face side until its foot sits flat on the face, the style edge rising toward the ${pole}; check with a try square that it stands at 90° to the face, then ${jointFixing(spec.plate.material)}. Its style must rise at ${psi}° from the plate (the site's |latitude|).`
      : `Fix the fin on the substyle, square to the face, its style rising at ${psi}° from the plate (the site's |latitude|) toward the ${pole}.`,
    `Mark the true meridian on the pillar top (true ${pole}, not magnetic: ${compassSentence(layout)}); refine it with the shadow of a plumb line at local apparent noon (the longitude correction and the equation of time in report.json, time). Never look at the Sun to find it.`,
  ];
  const p = pillarFixing(layout);
  if (!p) {
    steps.push(
      `Lay the plate on the pillar with its substyle (the reference line under the fin, through the root at ${rootAt}) on the meridian mark, the fin rising toward the true ${pole}, and bed it level in both directions (a digital level should read 0.0°) on an exterior adhesive or mortar for the pillar's stone.`,
    );
    return steps;
  }
  const d = (2 * layout.plate.holes[0].radiusMm).toFixed(1);
  steps.push(
    `Lay the plate (or its 1:1 paper template) on the pillar top with its substyle (the reference line under the fin, through the root at ${rootAt}) on the meridian mark, the fin rising toward the true ${pole}, and mark the ${p.studCount} hole centres through its Ø ${d} mm holes.`,
    `Drill each mark for the resin anchor of an ${p.size} stud, ${p.embedMm} mm deep as a first figure (the resin maker's data give the drill size and the depth), clean the dust out, and set the ${p.studCount} ${p.size} × ${p.studLengthMm} mm studs in the resin, upright, ${p.embedMm} mm in; leave it to cure as the maker says.`,
    `Run a levelling nut and a washer down each stud to about ${p.levellingGapMm} mm above the pillar top, lay the plate on them face up, and turn the nuts until a spirit level reads level in both directions (a digital level should read 0.0°); the gap lets rain run off under the plate.`,
    `Put a washer and a nylon-insert nut on each stud and tighten them evenly, holding the levelling nuts; check the level and the noon shadow once more. Cut any stud standing proud of its nut and file the end smooth.`,
  );
  return steps;
}

/** The fasteners of whatever carries the face: the horizontal plate's pillar studs, a wall mount's, or an equatorial stand's. */
function faceFasteners(layout: PlanarLayout): readonly FastenerRow[] {
  if (layout.faceType === 'horizontal') return pillarFixing(layout)?.fasteners ?? [];
  if (layout.faceType === 'equatorial') return equatorialStandApplies(layout) ? equatorialStand(layout).fasteners : [];
  return wallMount(layout)?.fasteners ?? [];
}
