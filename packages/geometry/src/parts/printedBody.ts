import type { PlateDrawing } from '../plate/plateDrawing.ts';
import type { DialLayout } from '../polar/layoutDial.ts';
import { bodySolid, type BodyPart } from './bodySolid.ts';
import type { PartsPlan } from './partsPlan.ts';
import { CUT_CLEAR_MM, fitToBed } from './printedParts.ts';
import { DOVETAIL_KEY, type SplitPart } from './splitForBed.ts';
import type { WedgePart } from './wedgeSolid.ts';

/**
 * The printed body (bodySolid: plate and gnomon in one print, on the wedge
 * when `parts.body.withWedge`) and, when it does not fit the bed, its
 * pieces. A body on its wedge is never split (a cut would run through the
 * tilted plate: every band is forbidden, so `fitToBed` refuses it when it
 * does not fit); a flat one is cut clear of the fin and the mounting holes,
 * allowing for the key on the cut's + side.
 * @param wedge the wedge to fuse on, used only with `parts.body.withWedge`
 * @example (await printedBody(layout, plateDrawing(layout), partsPlan(layout), null)).split // null when it fits
 */
export async function printedBody(layout: DialLayout, drawing: PlateDrawing, plan: PartsPlan, wedge: WedgePart | null): Promise<{ readonly body: BodyPart; readonly split: SplitPart | null }> {
  const g = layout.gnomon;
  const body = await bodySolid(layout, drawing, plan, plan.body.withWedge ? wedge : null);
  const fin = { y0: layout.plate.faceOriginY + g.y0Mm, y1: layout.plate.faceOriginY + g.y1Mm, x: layout.plate.substyleX, t: g.thicknessMm };
  const key = DOVETAIL_KEY.depthMm + CUT_CLEAR_MM;
  const clear = CUT_CLEAR_MM;
  const everywhere: [number, number][] = [[-Infinity, Infinity]];
  const split = await fitToBed(
    'body.stl',
    body.mesh,
    plan,
    body.withWedge
      ? { x: everywhere, y: everywhere }
      : {
          x: [[fin.x - fin.t / 2 - key, fin.x + fin.t / 2 + clear], ...drawing.holes.map((h): [number, number] => [h.cx - h.radiusMm - key, h.cx + h.radiusMm + clear])],
          y: [[fin.y0 - key, fin.y1 + clear], ...drawing.holes.map((h): [number, number] => [h.cy - h.radiusMm - key, h.cy + h.radiusMm + clear])],
        },
  );
  return { body, split };
}
