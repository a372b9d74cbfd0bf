import { dialGnomon, dialWedge } from '../parts/dialParts.ts';
import { isFilament } from '../parts/materials.ts';
import { meshVolumeMm3 } from '../parts/meshVolumeMm3.ts';
import { partMass } from '../parts/partMass.ts';
import { partsPlan } from '../parts/partsPlan.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { fastenerTable, wedgeFastenerRows, type FastenerRow } from '../stand/fastenerTable.ts';
import { flatStand } from '../stand/flatStand.ts';
import { sheetPartAreaMm2 } from '../stand/sheetPartAreaMm2.ts';

/** One step of the assembly, in order. */
export interface AssemblyStep {
  readonly title: string;
  readonly text: string;
}

/** One line of the weights table: a part, how many, what each weighs. */
export interface PartWeight {
  readonly part: string;
  readonly material: string;
  readonly quantity: number;
  readonly massKgEach: number;
  readonly massKg: number;
}

/** The assembly section of the installation sheet, as plain data. */
export interface AssemblyGuide {
  /** what carries the plate: the cut flat-pack stand or the printed wedge */
  readonly carrier: 'flat-pack stand' | 'printed wedge';
  readonly steps: readonly AssemblyStep[];
  /** which way the nodus faces and where it sits, or null without a nodus */
  readonly nodus: string | null;
  /** how to read the date lines and the mean-time curves (empty without them) */
  readonly reading: readonly string[];
  readonly weights: {
    readonly parts: readonly PartWeight[];
    /** everything listed, kg (fasteners not included) */
    readonly totalKg: number;
    readonly heaviestPieceKg: number;
    readonly note: string;
  };
  readonly fasteners: readonly FastenerRow[];
  readonly cautions: readonly string[];
}

/** Above this mass a piece is lifted by two people or with lifting gear (common practice for manual handling: about 25 kg for one person, less for many). */
export const TWO_PERSON_LIFT_KG = 25;

const METALS = new Set(['aluminium', 'brass', 'stainless', 'steel']);
const WOODS = new Set(['hardwood', 'plywood']);

/** How a tab-and-slot joint of a material is made permanent (common practice). */
export function jointFixing(material: string): string {
  if (material === 'aluminium') return 'TIG- or MIG-weld the tab ends from the back, or bond with a two-part structural epoxy for metals';
  if (material === 'brass') return 'silver-solder or braze the tab ends from the back, or bond with a two-part structural epoxy for metals';
  if (material === 'steel' || material === 'stainless') return 'TIG- or MIG-weld the tab ends from the back, or bond with a two-part structural epoxy for metals';
  if (WOODS.has(material)) return 'glue the tabs in their slots with an exterior wood glue (D3/D4 PVA or polyurethane) and clamp until set';
  if (material === 'acrylic') return 'run an acrylic solvent cement into the slots from the back (no heat)';
  if (material === 'slate') return 'set the tabs in a two-part epoxy for stone';
  return 'press the tabs home and fix them with a drop of two-part epoxy or cyanoacrylate';
}

/**
 * The assembly section of the installation sheet for a layout: the steps
 * in order (fix the gnomon, square it, assemble the stand or set out the
 * wedge, fix the plate, level, align to true north with the noon table,
 * anchor and tighten), which way the nodus faces, how to read the date
 * lines and the mean-time curves, the parts' weights and the total to lift
 * and ship (partMass: volume × the density table), the fastener table
 * (fastenerTable), and the cautions that go with them. The words name the
 * elevated pole for the hemisphere: the raised end points to true north in
 * the north and to true south in the south.
 *
 * @example assemblyGuide(layoutDial(spec)).steps.map((s) => s.title)
 */
export function assemblyGuide(layout: DialLayout): AssemblyGuide {
  const spec = layout.spec;
  const plan = partsPlan(layout);
  const pole = layout.hemisphere === 'north' ? 'north' : 'south';
  const tilt = Math.abs(spec.site.latitude);
  const g = layout.gnomon;
  const plateMaterial = spec.plate.material;
  const cutStand = plan.files.includes('stand.dxf') || plan.files.includes('stand.stl');
  const fin = dialGnomon(plan, layout);
  const gnomonMaterial = spec.process.method === 'print' ? (isFilament(plateMaterial) ? plateMaterial : 'pla') : plateMaterial;

  const weights: PartWeight[] = [];
  const add = (part: string, material: string, quantity: number, volumeMm3: number) => {
    const each = partMass(part, volumeMm3, material).massG / 1000;
    weights.push({ part, material, quantity, massKgEach: each, massKg: each * quantity });
  };
  const p = layout.plate;
  const r = Math.min(p.cornerRadiusMm, p.widthMm / 2, p.lengthMm / 2);
  const plateArea = p.widthMm * p.lengthMm - (4 - Math.PI) * r * r - p.holes.reduce((s, h) => s + Math.PI * h.radiusMm ** 2, 0) - p.slots.reduce((s, sl) => s + sl.widthMm * sl.heightMm, 0);
  add('plate', plateMaterial, 1, plateArea * p.thicknessMm);
  add('gnomon', gnomonMaterial, 1, fin.profileAreaMm2 * fin.thicknessMm);

  let fasteners: FastenerRow[];
  const steps: AssemblyStep[] = [];
  const tabs = g.tabs.length;
  steps.push({
    title: 'Fix the gnomon',
    text: `Push the fin's ${tabs} tab${tabs === 1 ? '' : 's'} through the plate's slot${tabs === 1 ? '' : 's'} from the face side until its foot sits flat on the face along its whole length, the style edge up; then ${jointFixing(gnomonMaterial)}. File or sand the tab ends flush with the back of the plate.`,
  });
  steps.push({
    title: 'Square it',
    text: `Before the fixing sets, check with a try square on both sides that the fin stands at 90° to the face, and sight along the style that it is straight. The 45° check: a 45° set square standing on the face with its corner on a 09:00 or 15:00 line (|hour angle| 45°) should touch the style edge that casts that line, ${g.heightMm.toFixed(1)} mm above the face and ${g.heightMm.toFixed(1)} mm from the line (the 45° check line on the plate's reference layer and the paper template shows where).`,
  });
  if (cutStand) {
    const stand = flatStand(layout);
    const d = stand.dims;
    for (const part of stand.parts) add(part.name, part.material, part.quantity ?? 1, sheetPartAreaMm2(part) * part.thicknessMm);
    fasteners = fastenerTable(layout, stand);
    const screws = fasteners[0];
    const anchors = fasteners.find((f) => f.use === 'feet to the ground');
    const rails = d.rails.length;
    steps.push({
      title: 'Assemble the stand',
      text: `Deburr every cut edge first. Lay the two FEET on a flat bench, slots up. Stand the two CHEEKS in them, the lower tabs in the feet's slots, both cheeks with their tall end over the same foot (that end goes toward the ${pole}). Slide the CROSS MEMBER's end tabs through the cheeks' slots from between them until the tabs are flush with the cheeks' outer faces. Lay the ${rails} SEAT RAILS across the cheeks' sloping top edges, the cheeks' upper tabs up through the rails' slots, the holes outboard of the cheeks. Check with a try square that the cheeks stand upright on the feet and the rails sit square across them, then make the joints permanent: ${jointFixing(d.material)}. A digital level laid on a rail reads ${tilt.toFixed(1)}°.`,
    });
    steps.push({
      title: 'Fix the plate to the stand',
      text: screws && screws.use === 'plate to seat rails'
        ? `Lay the plate on the rails, face up, its lower edge (by the numerals) flush with the lower rail's lower edge and its sides flush with the rails' ends: its ${screws.count} holes fall on the rails' holes. Fit the ${screws.size} × ${screws.lengthMm} mm screws from the face${screws.countersink === 'none' ? '' : ` (countersink the plate's holes ${screws.countersink} first)`}, a washer and a nylon-insert nut under each rail. Snug them, do not tighten yet.`
        : 'The plate has no mounting holes (holes.count 0): bond it to the rails with an exterior adhesive suited to both materials, its lower edge flush with the lower rail\'s lower edge.',
    });
    steps.push({
      title: 'Level',
      text: `Set the stand where it will stay, on a firm, level base (a concrete pad or a paving slab bedded on mortar). Shim under the feet until a spirit level laid across each foot reads level; a digital level on the face along the style then reads ${tilt.toFixed(1)}°.`,
    });
    steps.push({
      title: `Align to true ${pole}`,
      text: `Turn the whole stand until the style lies in the geographic meridian with the raised end toward true ${pole} (section 2), then refine at local apparent noon with the table of section 3: at those clock times the shadow of a plumb line, or of the fin itself, falls exactly along the style.`,
    });
    steps.push({
      title: 'Anchor and tighten',
      text: `${anchors ? `Mark and drill through the feet's ${anchors.count} holes and fit the ${anchors.size} ground anchors (${anchors.lengthMm} mm or as the anchor maker's data require for your ground); ` : 'Fix the feet to the base as local codes require; '}tighten the anchors and then the plate screws, evenly. Check the tilt and the noon shadow once more.`,
    });
  } else {
    const wedge = dialWedge(plan, layout);
    add('wedge', gnomonMaterial, 1, meshVolumeMm3(wedge.mesh));
    fasteners = wedgeFastenerRows(layout);
    steps.push({
      title: 'Set out the wedge',
      text: `Lay the printed wedge on a firm, level base, its thin end toward the equator and its raised end (and the meridian arrow) toward the ${pole}.`,
    });
    steps.push({
      title: 'Fix the plate to the wedge',
      text: "Lay the plate on the wedge's seat, its lower edge against the lip, centred across the seat; fix it through its holes into the wedge (screws into the wedge's nut pockets or heat-set inserts where the wedge has them, else a weatherproof adhesive).",
    });
    steps.push({ title: 'Level', text: `Shim under the wedge until a spirit level across it reads level; a digital level on the face along the style then reads ${tilt.toFixed(1)}°.` });
    steps.push({
      title: `Align to true ${pole}`,
      text: `Turn the wedge until its arrow and the style lie in the geographic meridian, the raised end toward true ${pole} (section 2), then refine at local apparent noon with the table of section 3.`,
    });
    steps.push({ title: 'Anchor and tighten', text: "Screw the wedge's toe to the base through its mounting holes, evenly; check the tilt and the noon shadow once more." });
  }

  const gs = spec.gnomon;
  const nodus = gs.nodus || spec.parts.nodus
    ? `The nodus is the point of the style edge at the middle of the notch cut into it, ${Math.abs(gs.nodusY).toFixed(1)} mm ${gs.nodusY === 0 ? 'at' : gs.nodusY > 0 ? 'toward the raised end from' : 'toward the lower end from'} the middle of the hour lines. On the face the notch lets a small bite of light into the edge of the fin's shadow: read the middle of that bite where it opens on the shadow's edge, not its tip (the tip is the shadow of the notch's bottom, which lies below the style: it would read the date off by about the notch's depth). The notch is the same from both sides: either face of the fin may look east.`
    : null;
  const reading: string[] = [];
  if (nodus !== null && spec.calendar.lines.length + spec.calendar.dates.length > 0) {
    reading.push(`Date lines: the nodus's shadow point runs along one date line through the day; on the dates named it lies on that line. The local summer solstice line lies toward the plate's lower (equator-ward) end, the winter one toward the raised end, the equinox line between (straight).`);
  }
  if (spec.dial.meanTimeCurves) {
    reading.push('Mean-time curves: each figure-of-eight is one hour of standard clock time (daylight saving not included). When the nodus\'s shadow point lies on a curve it is that clock hour; use the branch of the figure for the half of the year you are in (its label), since the two branches cross.');
  }

  const total = { massKg: weights.reduce((sum, w) => sum + w.massKg, 0) };
  const heaviest = Math.max(...weights.map((w) => w.massKgEach));
  const cautions = [
    total.massKg > TWO_PERSON_LIFT_KG
      ? `Heavy: the parts weigh ${total.massKg.toFixed(1)} kg in all; lift with two people or lifting gear.`
      : `The parts weigh ${total.massKg.toFixed(1)} kg in all (heaviest piece ${heaviest.toFixed(2)} kg); lift the assembled dial by its stand, never by the gnomon.`,
    METALS.has(plateMaterial) || (cutStand && METALS.has(spec.stand.material ?? plateMaterial))
      ? 'Sharp edges: cut metal edges and the gnomon\'s corners are sharp; deburr them and wear gloves while assembling.'
      : 'Edges: sand cut edges smooth and round the gnomon\'s corners before assembly.',
    'Outdoor mounting: anchor the dial against wind, frost heave and knocks as local building codes require; ask a licensed installer for any mounting on a wall, a roof or above people.',
  ];
  return {
    carrier: cutStand ? 'flat-pack stand' : 'printed wedge',
    steps,
    nodus,
    reading,
    weights: {
      parts: weights,
      totalKg: total.massKg,
      heaviestPieceKg: heaviest,
      note: `masses from each part's volume × its material's density (typical values; an estimate, not a weighing); fasteners not included${cutStand ? '' : '; the wedge as modelled, printed solid (infill makes it lighter)'}`,
    },
    fasteners,
    cautions,
  };
}
