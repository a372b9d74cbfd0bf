import type { Producer } from './outputTypes.ts';

/** The pictures outputs of `umbrafab build` (filled in by the pictures work). */
export const picturesOutputs: Producer = () => ({ files: [], report: {} });
