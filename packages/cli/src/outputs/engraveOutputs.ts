import type { Producer } from './outputTypes.ts';

/** The engrave outputs of `umbrafab build` (filled in by the engrave work). */
export const engraveOutputs: Producer = () => ({ files: [], report: {} });
