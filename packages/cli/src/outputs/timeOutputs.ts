import { calendarLines, equationOfTimeTable, installSheet, meanTimeLines, nodusFootY, timeFaceExtras } from '@umbrafab/geometry';
import { toInstallMd } from '@umbrafab/fabricate';
import { utf8, type Producer } from './outputTypes.ts';

/** Equation-of-time table spacing in report.json, days (at least one value a week). */
const EOT_STEP_DAYS = 7;

/**
 * Sun time to clock time: install.md, and the report's `time.equationOfTime`
 * (12:00 UT, weekly through calendar.year), `calendar` (date lines: x as for
 * the marks, y from the nodus foot toward the elevated pole), `meanTimeCurves`
 * and `install` sections. The curves themselves reach plate.dxf, preview.svg
 * and the engraving through buildFiles (timeFaceExtras → plateDrawing).
 */
export const timeOutputs: Producer = ({ layout }) => {
  const sheet = installSheet(layout);
  const dateLines = calendarLines(layout);
  const mean = meanTimeLines(layout);
  const extras = timeFaceExtras(layout);
  return {
    files: [{ name: 'install.md', bytes: utf8(toInstallMd(sheet)) }],
    report: {
      time: {
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
