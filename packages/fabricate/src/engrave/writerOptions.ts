/** Options shared by the G-code writers. */
export interface GcodeWriterOptions {
  /** Decimals of coordinates, mm. Default 3 (1 µm). */
  readonly decimals?: number;
  /** Order cuts for short rapid travel. false keeps the input order and directions. Default true. */
  readonly optimizeOrder?: boolean;
}

export const GCODE_WRITER_DEFAULTS = { decimals: 3, optimizeOrder: true } as const satisfies Required<GcodeWriterOptions>;

/** Merge over the defaults and check `decimals` (an integer 0…6). */
export function resolveWriterOptions(options: GcodeWriterOptions = {}): Required<GcodeWriterOptions> {
  const o = { ...GCODE_WRITER_DEFAULTS, ...options };
  if (!Number.isInteger(o.decimals) || o.decimals < 0 || o.decimals > 6) {
    throw new Error(`decimals must be an integer from 0 to 6, got ${String(o.decimals)}`);
  }
  return o;
}
