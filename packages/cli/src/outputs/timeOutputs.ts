import { calendarLines, equationOfTimeTable, installSheet, meanTimeLines, nodusFootY, timeFaceExtras, type FacePolyline, type InstallSheet, type TimeLayout } from '@umbrafab/geometry';
import { toInstallMd } from '@umbrafab/fabricate';
import { utf8, type Producer } from './outputTypes.ts';
import { polarTemplateGuide } from './picturesOutputs.ts';

/** The report.json sections of sun time and clock time (docs/design.md §3–4). */
export interface TimeSections {
  readonly time: TimeSection;
  /** the date (declination) lines of a nodus, empty without one */
  readonly calendar: readonly CalendarSection[];
  /** figure-of-eight mean-time curves (`dial.meanTimeCurves`), empty without them */
  readonly meanTimeCurves: readonly { readonly clockTime: string; readonly polylines: readonly FacePolyline[] }[];
  /** date lines drawn without an engraved label (no free room beside them) */
  readonly unlabelledDateLines: readonly string[];
  /** everything install.md says, as data */
  readonly install: InstallSheet;
}

/** How the dial reads and the corrections to clock time. */
export interface TimeSection extends TimeLayout {
  /** equation of time E = apparent − mean solar time at 12:00 UT, weekly through calendar.year, minutes */
  readonly equationOfTime: readonly { readonly date: string; readonly minutes: number }[];
  /** face y of the nodus foot, mm (with a nodus) */
  readonly nodusYMm?: number;
}

/** One date line: x as for the marks, y from the nodus foot toward the elevated pole, mm. */
export interface CalendarSection {
  readonly label: string;
  readonly engravedLabel: string;
  /** local dates the line stands for, 'YYYY-MM-DD' */
  readonly dates: readonly string[];
  /** the Sun's declination, degrees, north positive */
  readonly declinationDeg: number;
  /** every point of the line, all branches together */
  readonly points: FacePolyline;
  /** one polyline per style edge that casts the nodus shadow */
  readonly branches: readonly FacePolyline[];
}

/** Equation-of-time table spacing in report.json, days (at least one value a week). */
const EOT_STEP_DAYS = 7;

/**
 * Sun time to clock time: install.md, and the report's `time` section (how
 * the dial reads, the longitude correction, the equation of time at 12:00 UT
 * weekly through calendar.year), `calendar` (date lines: x as for
 * the marks, y from the nodus foot toward the elevated pole), `meanTimeCurves`
 * and `install` sections. The curves themselves reach plate.dxf, preview.svg
 * and the engraving through buildFiles (timeFaceExtras → plateDrawing).
 */
export const timeOutputs: Producer<TimeSections> = (ctx) => {
  const { layout } = ctx;
  const sheet = installSheet(layout);
  const dateLines = calendarLines(layout);
  const mean = meanTimeLines(layout);
  const extras = timeFaceExtras(layout);
  return {
    files: [{ name: 'install.md', bytes: utf8(toInstallMd(sheet, polarTemplateGuide(ctx) ?? undefined)) }],
    report: {
      time: {
        ...layout.time,
        equationOfTime: equationOfTimeTable(layout.spec.calendar.year, EOT_STEP_DAYS),
        ...(layout.spec.gnomon.nodus ? { nodusYMm: nodusFootY(layout) } : {}),
      },
      calendar: dateLines.map((l) => ({
        label: l.label,
        engravedLabel: l.engravedLabel,
        dates: l.dates,
        declinationDeg: l.declinationDeg,
        points: l.branches.flat(),
        branches: l.branches,
      })),
      meanTimeCurves: mean.map((c) => ({ clockTime: c.clockTime, polylines: c.polylines })),
      unlabelledDateLines: extras.unlabelled,
      install: sheet,
    },
  };
};
