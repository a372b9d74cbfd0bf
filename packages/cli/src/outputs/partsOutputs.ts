import type { Producer } from './outputTypes.ts';

/** The parts outputs of `umbrafab build` (filled in by the parts work). */
export const partsOutputs: Producer = () => ({ files: [], report: {} });
