import type { Producer } from './outputTypes.ts';

/** The time outputs of `umbrafab build` (filled in by the time work). */
export const timeOutputs: Producer = () => ({ files: [], report: {} });
