import { cutOutputs } from './cutOutputs.ts';
import { engraveOutputs } from './engraveOutputs.ts';
import { partsOutputs } from './partsOutputs.ts';
import { picturesOutputs } from './picturesOutputs.ts';
import { plateOutputs } from './plateOutputs.ts';
import { standOutputs } from './standOutputs.ts';
import { sheetOutputs } from './sheetOutputs.ts';
import { timeOutputs } from './timeOutputs.ts';
import type { Producer } from './outputTypes.ts';

/**
 * Every producer of `umbrafab build`, in file order. Add an output group:
 * one file in outputs/ (its report sections typed beside it), one line here
 * and one in report.ts. No two producers write the same report section.
 */
export const PRODUCERS: readonly Producer[] = [plateOutputs, partsOutputs, standOutputs, sheetOutputs, engraveOutputs, cutOutputs, timeOutputs, picturesOutputs];

/** Indices of PRODUCERS in the order they are started: the pictures (PNGs render on worker threads) first. */
export const START_ORDER: readonly number[] = [PRODUCERS.indexOf(picturesOutputs), ...PRODUCERS.map((_, i) => i).filter((i) => PRODUCERS[i] !== picturesOutputs)];

/** START_ORDER with the engraving first, for a build with an engraving worker: its producer only hands the job over, and the worker's part is the longest. */
export const START_ORDER_ENGRAVING_ON_WORKER: readonly number[] = [PRODUCERS.indexOf(engraveOutputs), ...START_ORDER.filter((i) => PRODUCERS[i] !== engraveOutputs)];
