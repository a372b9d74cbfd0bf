import { cutOutputs } from './cutOutputs.ts';
import { engraveOutputs } from './engraveOutputs.ts';
import { partsOutputs } from './partsOutputs.ts';
import { picturesOutputs } from './picturesOutputs.ts';
import { plateOutputs } from './plateOutputs.ts';
import { timeOutputs } from './timeOutputs.ts';
import type { Producer } from './outputTypes.ts';

/**
 * Every producer of `umbrafab build`, in file order. Add an output group:
 * one file in outputs/, one line here. Sections of report.json with the same
 * top-level key are merged shallowly (later producers add keys).
 */
export const PRODUCERS: readonly Producer[] = [plateOutputs, partsOutputs, engraveOutputs, cutOutputs, timeOutputs, picturesOutputs];

/** Indices of PRODUCERS in the order they are started: the pictures (PNGs render on worker threads) first. */
export const START_ORDER: readonly number[] = [PRODUCERS.indexOf(picturesOutputs), ...PRODUCERS.map((_, i) => i).filter((i) => PRODUCERS[i] !== picturesOutputs)];
