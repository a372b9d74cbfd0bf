import type { ProcessMethod } from '@umbrafab/geometry';

/** The two engraving programs umbrafab writes. */
export type EngraveProgram = 'ngc' | 'laser';

/** File name of each program. */
export const ENGRAVE_FILE_NAMES: Readonly<Record<EngraveProgram, string>> = {
  ngc: 'engrave.ngc',
  laser: 'engrave-laser.gcode',
};

/** The spec's `engrave.programs` choice. */
export type EngraveProgramsChoice = 'auto' | 'ngc' | 'laser' | 'both' | 'none';

/**
 * Which programs a build writes (spec `engrave.programs`, see
 * engraveSection.ts). `auto` follows `process.method`: a router engraves its
 * own plate (engrave.ngc); a laser scores it (engrave-laser.gcode); a
 * waterjet cannot score (docs/design.md §5), so its lines are engraved by a router or
 * mill as a second step (engrave.ngc); a printed plate carries its lines in
 * the print (none).
 *
 * @returns the programs in file order (ngc before laser)
 * @example engraveProgramsFor('auto', 'waterjet') // ['ngc']
 */
export function engraveProgramsFor(choice: EngraveProgramsChoice, method: ProcessMethod): readonly EngraveProgram[] {
  switch (choice) {
    case 'auto':
      switch (method) {
        case 'router':
        case 'waterjet':
          return ['ngc'];
        case 'laser':
          return ['laser'];
        case 'print':
          return [];
        default: {
          const never: never = method;
          throw new Error(`process.method ${String(never)} is unknown; allowed: laser, waterjet, router, print`);
        }
      }
    case 'ngc':
      return ['ngc'];
    case 'laser':
      return ['laser'];
    case 'both':
      return ['ngc', 'laser'];
    case 'none':
      return [];
    default: {
      const never: never = choice;
      throw new Error(`engrave.programs ${String(never)} is unknown; allowed: auto, ngc, laser, both, none`);
    }
  }
}
