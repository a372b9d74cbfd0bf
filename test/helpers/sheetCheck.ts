import { execFileSync } from 'node:child_process';
import { join, resolve } from 'node:path';

/** What test/helpers/sheet_check.py reports of a sheet.dxf, read with shapely (Debian python3-shapely). */
export interface SheetCheck {
  readonly parts: number;
  readonly valid: boolean;
  readonly maxOverlapMm2: number;
  /** null with a single part */
  readonly minDistanceMm: number;
  readonly outsideMm2: number;
  readonly edgeMm: number;
}

/** The parts' cut regions of a sheet.dxf on a `widthMm` x `lengthMm` sheet, checked by shapely. */
export function sheetCheck(file: string, widthMm: number, lengthMm: number): SheetCheck {
  const script = join(resolve(import.meta.dirname), 'sheet_check.py');
  return JSON.parse(execFileSync('/usr/bin/python3', [script, file, String(widthMm), String(lengthMm)], { encoding: 'utf8' })) as SheetCheck;
}
