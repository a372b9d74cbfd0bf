import type { EngraveJob } from './engraveInput.ts';
import { formatDuration, type TimeEstimate } from './estimateTime.ts';
import { formatNumber } from './formatNumber.ts';
import type { GcodeRecord } from './gcodeRecords.ts';

/** Which writer a header is for. */
export type EngraveProcess = 'mill' | 'laser';

const mm = (value: number): string => formatNumber(value, 3);

/** Header comments on units, work origin and stock. */
export function stockComments(job: EngraveJob, process: EngraveProcess): readonly GcodeRecord[] {
  const st = job.stock;
  return [
    { kind: 'comment', text: 'units: millimetres [G21], absolute coordinates [G90], XY plane [G17], feed in mm/min [G94]' },
    {
      kind: 'comment',
      text:
        process === 'mill'
          ? 'work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf], Z0 = top of the stock'
          : 'work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf]; no Z moves: set the focus by hand',
    },
    { kind: 'comment', text: `stock: ${mm(st.widthMm)} x ${mm(st.lengthMm)} x ${mm(st.thicknessMm)} mm, material ${st.material}` },
  ];
}

/**
 * Cautions at the top of every program (common practice; the machine maker's
 * instructions, the shop's rules and local codes come first).
 */
export function safetyComments(process: EngraveProcess): readonly GcodeRecord[] {
  const lines =
    process === 'mill'
      ? [
          'CAUTION: dry-run this program above the stock and cut a test groove on scrap first',
          'CAUTION: clamp the stock, guard the machine, wear eye and hearing protection',
          'CAUTION: feeds and speeds are common-practice starting points, not tuned to your machine',
        ]
      : [
          'CAUTION: laser mode [GRBL $32=1] required; never engrave PVC, vinyl or other chlorinated plastics',
          'CAUTION: run fume extraction, wear eye protection rated for the laser, never leave it unattended',
          'CAUTION: bare aluminium, brass and steel reflect CO2 and diode lasers; follow the maker manual',
        ];
  return lines.map((text) => ({ kind: 'comment', text }) as const);
}

/** Header comments on the time estimate, the rapid travel and the spec summary lines. */
export function figureComments(f: {
  readonly rapidTravelMm: { readonly inputOrder: number; readonly ordered: number; readonly lowerBound: number };
  readonly estimate: TimeEstimate;
  readonly title: readonly string[];
  readonly process: EngraveProcess;
}): readonly GcodeRecord[] {
  const e = f.estimate;
  const t = f.rapidTravelMm;
  const s = (v: number): string => `${formatNumber(v, 0)} s`;
  const parts =
    f.process === 'mill'
      ? `cutting ${s(e.cuttingS)}, plunges ${s(e.plungeS)}, rapids ${s(e.rapidS + e.retractS)}, dwells ${s(e.dwellS)}; ignores acceleration and tool changes, so the job takes longer`
      : `burning ${s(e.cuttingS)}, travel ${s(e.rapidS + e.retractS)}; ignores acceleration, so the job takes longer`;
  return [
    { kind: 'comment', text: `estimated time: ${formatDuration(e.totalS)} [${s(e.totalS)}: ${parts}]` },
    {
      kind: 'comment',
      text: `rapid travel XY: ${formatNumber(t.ordered, 1)} mm [input order ${formatNumber(t.inputOrder, 1)} mm, lower bound ${formatNumber(t.lowerBound, 1)} mm]`,
    },
    ...f.title.map((line): GcodeRecord => ({ kind: 'comment', text: `spec: ${line}` })),
  ];
}
