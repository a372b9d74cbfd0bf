import type { EngraveJob, EngravePath } from './engraveInput.ts';

/**
 * Small hand-made jobs for tests and examples (invented data, not a real dial).
 * Not re-exported from index.ts.
 */

const mark = (label: string, x: number, y0: number, y1: number, widthMm: number): EngravePath => ({
  points: [
    [x, y0],
    [x, y1],
  ],
  closed: false,
  widthMm,
  operation: 'marks',
  label,
});

/**
 * A 200 x 150 x 3 mm aluminium plate: seven hour lines 0.5 mm wide, four
 * half-hour lines 0.3 mm wide, a zigzag 'glyph' 0.4 mm wide, and a closed
 * border loop 0.3 mm wide. Listed in a deliberately poor order.
 */
export const SAMPLE_PLATE_JOB: EngraveJob = {
  stock: { widthMm: 200, lengthMm: 150, thicknessMm: 3, material: 'aluminium' },
  title: ['sample plate: 7 hour lines, 4 half-hour lines, one zigzag glyph, one border', 'latitude 51.5° N (invented)'],
  paths: [
    mark('hour 12', 100, 30, 130, 0.5),
    mark('hour 07', 20, 30, 130, 0.5),
    mark('hour 17', 180, 30, 130, 0.5),
    mark('half 09:30', 70, 50, 130, 0.3),
    mark('hour 09', 60, 30, 130, 0.5),
    mark('hour 15', 140, 30, 130, 0.5),
    mark('half 14:30', 130, 50, 130, 0.3),
    mark('hour 08', 38, 30, 130, 0.5),
    mark('half 11:30', 92, 50, 130, 0.3),
    mark('hour 16', 162, 30, 130, 0.5),
    mark('half 12:30', 108, 50, 130, 0.3),
    {
      points: [
        [90, 12],
        [93, 22],
        [96, 14],
        [99, 22],
        [102, 14],
        [105, 22],
        [108, 12],
      ],
      closed: false,
      widthMm: 0.4,
      operation: 'text',
      label: 'glyph W',
    },
    {
      points: [
        [5, 5],
        [195, 5],
        [195, 145],
        [5, 145],
      ],
      closed: true,
      widthMm: 0.3,
      operation: 'curves',
      label: 'border',
    },
  ],
};

/** Two wide marks (2.4 mm) and a thin glyph, for the flat end mill. */
export const SAMPLE_WIDE_MARK_JOB: EngraveJob = {
  stock: { widthMm: 120, lengthMm: 80, thicknessMm: 4, material: 'brass' },
  title: ['sample: wide noon marks'],
  paths: [
    mark('noon band west', 55, 10, 70, 2.4),
    mark('noon band east', 65, 10, 70, 2.4),
    {
      points: [
        [20, 20],
        [25, 30],
        [30, 20],
      ],
      closed: false,
      widthMm: 0.3,
      operation: 'text',
      label: 'glyph V',
    },
  ],
};
