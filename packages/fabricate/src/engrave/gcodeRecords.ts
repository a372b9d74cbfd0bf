import { formatNumber } from './formatNumber.ts';
import { ngcComment } from './ngcComment.ts';

/**
 * The intermediate record list both G-code writers build before serialising,
 * and the one serialiser. Targets are absolute (G90), mm; only the axes given
 * are written.
 */

/** Coolant a program may switch on: M7 mist or M8 flood. */
export type CoolantMode = 'mist' | 'flood';

/** A move target: the axes to write. */
export interface AxisTarget {
  readonly x?: number;
  readonly y?: number;
  readonly z?: number;
}

export type GcodeRecord =
  /** A comment line `( … )`, made safe by ngcComment. */
  | { readonly kind: 'comment'; readonly text: string }
  /** Modal words written as they are, e.g. 'G21 G90 G17 G94'. */
  | { readonly kind: 'modal'; readonly words: string }
  /** G0 rapid. */
  | { readonly kind: 'rapid'; readonly to: AxisTarget }
  /** G1 feed; the F word is written only when it changes. */
  | { readonly kind: 'feed'; readonly to: AxisTarget; readonly feedMmPerMin: number }
  /** M3 (cw) / M4 (ccw, laser dynamic power) with an S word, or M5 (off). */
  | { readonly kind: 'spindle'; readonly mode: 'cw' | 'ccw' | 'off'; readonly s?: number }
  /** A bare S word: spindle speed, or laser power in M4 mode. */
  | { readonly kind: 'power'; readonly s: number }
  /** T… M6. */
  | { readonly kind: 'toolChange'; readonly tool: number }
  /** G4 P… dwell, seconds (RS274NGC and GRBL both read P as seconds). */
  | { readonly kind: 'dwell'; readonly seconds: number }
  /** M7 mist, M8 flood, M9 all coolant off. */
  | { readonly kind: 'coolant'; readonly mode: CoolantMode | 'off' }
  /**
   * G2 (cw) / G3 (ccw) arc in the XY plane to `to` (with an optional Z for a
   * helix), centre at `centre` (written as I, J offsets from the start).
   */
  | { readonly kind: 'arc'; readonly clockwise: boolean; readonly to: AxisTarget; readonly centre: readonly [number, number]; readonly from: readonly [number, number]; readonly feedMmPerMin: number }
  /** M2 program end. */
  | { readonly kind: 'end' };

export interface SerializeOptions {
  /**
   * Wrap the program in '%' lines (the RS-274/NGC tape delimiters: LinuxCNC
   * reads a file that starts with '%' up to the next '%'; memory). Default false.
   */
  readonly percent?: boolean;
}

/**
 * Serialise records to G-code text, one block per line, '\n' line ends and a
 * final newline. Coordinates are written with `decimals` places, F and S words
 * with trailing zeros trimmed (formatNumber).
 */
export function serializeGcode(records: readonly GcodeRecord[], decimals: number, options: SerializeOptions = {}): string {
  const lines: string[] = options.percent ? ['%'] : [];
  let feed: string | undefined;
  const axes = (to: AxisTarget): string =>
    (to.x === undefined ? '' : ` X${formatNumber(to.x, decimals)}`) + (to.y === undefined ? '' : ` Y${formatNumber(to.y, decimals)}`) + (to.z === undefined ? '' : ` Z${formatNumber(to.z, decimals)}`);
  for (const r of records) {
    switch (r.kind) {
      case 'comment':
        lines.push(`(${ngcComment(r.text)})`);
        break;
      case 'modal':
        lines.push(r.words);
        break;
      case 'rapid':
        lines.push(`G0${axes(r.to)}`);
        break;
      case 'feed': {
        const f = formatNumber(r.feedMmPerMin, decimals, true);
        lines.push(`G1${axes(r.to)}${f === feed ? '' : ` F${f}`}`);
        feed = f;
        break;
      }
      case 'spindle':
        if (r.mode === 'off') lines.push('M5');
        else lines.push(`${r.s === undefined ? '' : `S${formatNumber(r.s, decimals, true)} `}${r.mode === 'cw' ? 'M3' : 'M4'}`);
        break;
      case 'power':
        lines.push(`S${formatNumber(r.s, decimals, true)}`);
        break;
      case 'toolChange':
        lines.push(`T${r.tool} M6`);
        break;
      case 'dwell':
        lines.push(`G4 P${formatNumber(r.seconds, 3, true)}`);
        break;
      case 'coolant':
        lines.push(r.mode === 'mist' ? 'M7' : r.mode === 'flood' ? 'M8' : 'M9');
        break;
      case 'arc': {
        const f = formatNumber(r.feedMmPerMin, decimals, true);
        const i = formatNumber(r.centre[0] - r.from[0], decimals);
        const j = formatNumber(r.centre[1] - r.from[1], decimals);
        lines.push(`${r.clockwise ? 'G2' : 'G3'}${axes(r.to)} I${i} J${j}${f === feed ? '' : ` F${f}`}`);
        feed = f;
        break;
      }
      case 'end':
        lines.push('M2');
        break;
      default: {
        const never: never = r;
        throw new Error(`unknown G-code record ${JSON.stringify(never)}`);
      }
    }
  }
  if (options.percent) lines.push('%');
  return `${lines.join('\n')}\n`;
}

/** Serialised program bodies, by record list and decimals (a batch writes one body under many headers). */
const bodyTexts = new WeakMap<readonly GcodeRecord[], Map<number, string>>();

/**
 * serializeGcode([...header, ...body]) with the body's text kept: the same
 * body array under another header is not serialised again. Byte for byte the
 * same as serializeGcode: a header of comments only sets no modal state (the
 * F word of the body's first feed is written either way); any other header
 * goes through serializeGcode whole.
 *
 * @example serializeProgram([{ kind: 'comment', text: 'job' }], plan.body, 3, { percent: true })
 */
export function serializeProgram(header: readonly GcodeRecord[], body: readonly GcodeRecord[], decimals: number, options: SerializeOptions = {}): string {
  if (header.length === 0 || body.length === 0 || header.some((r) => r.kind !== 'comment')) return serializeGcode([...header, ...body], decimals, options);
  let byDecimals = bodyTexts.get(body);
  if (!byDecimals) bodyTexts.set(body, (byDecimals = new Map()));
  let bodyText = byDecimals.get(decimals);
  if (bodyText === undefined) byDecimals.set(decimals, (bodyText = serializeGcode(body, decimals)));
  const percent = options.percent ? '%\n' : '';
  return `${percent}${serializeGcode(header, decimals)}${bodyText}${percent}`;
}
