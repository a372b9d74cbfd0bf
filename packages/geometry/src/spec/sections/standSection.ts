import { z } from 'zod';
import { boundedNumber } from '../boundedNumber.ts';
import { MATERIALS } from '../materials.ts';

/**
 * The `stand:` section of the dial spec: the flat-pack latitude stand that
 * laser, waterjet and router jobs cut from sheet stock (stand.dxf, and
 * stand.stl as assembled). Cross-field rules (the stand's height against
 * the screws, the cheeks against the plate width) are checked by
 * `standPlan`, which knows the layout.
 */
export const standSection = z
  .strictObject({
    material: z
      .enum(MATERIALS, { error: `allowed: ${MATERIALS.map((v) => JSON.stringify(v)).join(', ')}` })
      .optional()
      .describe('sheet material of the stand (default: plate.material)'),
    thickness: boundedNumber({ min: 1, max: 50, unit: 'mm' }).optional().describe('sheet thickness of the stand, mm (default: plate.thickness); tabs are this long, slots this wide plus process.clearance each side'),
    lowEnd: boundedNumber({ min: 10, max: 500, unit: 'mm' }).default(40).describe('height of the cheeks at the plate\'s lower end, above the feet, mm (room for the nuts under the seat rails)'),
    anchors: z.union([z.literal(0), z.literal(4)], { error: 'allowed: 0 or 4' }).default(4).describe('ground anchor holes in the feet: 4 (two in each foot, outside the cheeks) or 0'),
    anchorDiameter: boundedNumber({ min: 3, max: 30, unit: 'mm' }).default(9).describe('ground anchor hole diameter, mm (9 clears an M8 anchor bolt)'),
  })
  .prefault({});

export type StandSpec = z.output<typeof standSection>;
