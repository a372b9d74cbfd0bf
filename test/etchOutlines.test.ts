import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { drawingStrokes, drawnCurvesFromLayout, strokeOutlines } from '@umbrafab/geometry';
import { buildContext, buildFiles, readSpecFile } from '@umbrafab/cli';
import { ezdxfDump } from './helpers/ezdxf.ts';

const ROOT = resolve(import.meta.dirname, '..');
const spec = readSpecFile(join(ROOT, 'fixtures/specs/waterjet-nodus-60n.yaml'));
const dir = mkdtempSync(join(tmpdir(), 'umbrafab-etch-'));

describe('etch outlines of a 60° N waterjet nodus plate (fixtures/specs/waterjet-nodus-60n.yaml)', async () => {
  const built = await buildFiles(spec);
  const drawing = buildContext(spec).drawing;
  const strokes = drawingStrokes(drawing.lines, drawing.text);
  const outlines = await strokeOutlines(strokes, spec.cutFiles.chordTolerance);
  writeFileSync(join(dir, 'plate.dxf'), built.files.find((f) => f.name === 'plate.dxf')!.bytes);
  const dump = ezdxfDump(join(dir, 'plate.dxf'));
  const etch = (built.report.plate as unknown as { cut: { etch: { pierces: number; regions: number; chordToleranceMm: number } } }).cut.etch;

  it('writes one closed LINE_ETCH_OUTLINE polyline per ring of the union (the pierce count in report.json), nothing single-stroke on a plotting layer', () => {
    // Read back with ezdxf (Debian python3-ezdxf).
    expect(dump.errors).toEqual([]);
    const rings = dump.entities.filter((e) => e.layer === 'LINE_ETCH_OUTLINE');
    expect(rings.every((e) => e.type === 'LWPOLYLINE' && e.closed)).toBe(true);
    expect(rings.length).toBe(outlines.rings);
    expect(etch.pierces).toBe(outlines.rings);
    expect(etch.regions).toBe(outlines.regions.length);
    expect(etch.chordToleranceMm).toBeLessThanOrEqual(0.01);
    expect(dump.entities.filter((e) => e.layer === 'LINE_SCORE' || e.layer === 'TEXT_ENGRAVE')).toEqual([]);
    // Before: one 4-corner outline per segment of every mark and curve (text left single-stroke).
    const before = drawing.lines.reduce((n, l) => n + l.path.points.length - 1, 0);
    console.log(`pierces: ${before} segment outlines before (text not etchable), ${outlines.rings} closed outlines in ${outlines.regions.length} regions after (text included)`);
    expect(outlines.rings).toBeLessThan(before / 4);
  });

  it('is valid, free of overlaps, and covers the area of the strokes within 0.1 % (shapely)', () => {
    // Source: shapely (Debian python3-shapely): each stroke buffered by width/2 (flat caps for marks and
    // curves, round caps for text, round joins), unioned, against our outlines.
    const input = join(dir, 'etch.json');
    writeFileSync(input, JSON.stringify({ strokes, regions: outlines.regions }));
    const out = JSON.parse(execFileSync('/usr/bin/python3', [join(ROOT, 'test/helpers/etch_check.py'), input], { encoding: 'utf8' })) as {
      regions: number;
      invalid: number[];
      maxOverlapMm2: number;
      outlineAreaMm2: number;
      strokeUnionAreaMm2: number;
      strokeUnionRegions: number;
    };
    const err = Math.abs(out.outlineAreaMm2 - out.strokeUnionAreaMm2) / out.strokeUnionAreaMm2;
    console.log(`etch outlines: ${out.regions} regions (shapely's union: ${out.strokeUnionRegions}), area ${out.outlineAreaMm2.toFixed(3)} vs ${out.strokeUnionAreaMm2.toFixed(3)} mm² (${(100 * err).toFixed(4)} %), largest overlap ${out.maxOverlapMm2.toExponential(2)} mm²`);
    expect(out.invalid).toEqual([]);
    expect(out.maxOverlapMm2).toBeLessThan(1e-6);
    expect(err).toBeLessThan(0.001);
    expect(out.regions).toBe(out.strokeUnionRegions);
  });

  it('keeps the marks, date lines and mean-time curves readable by umbrafab check --plate: centre-lines on MARK_CENTRE_NO_CUT, off and non-plotting', () => {
    const centres = dump.entities.filter((e) => e.layer === 'MARK_CENTRE_NO_CUT');
    // One per engraved mark and one per piece of a date line or curve (the engraved equation-of-time table is not read back).
    const pieces = drawnCurvesFromLayout(built.layout).reduce((n, c) => n + c.paths.length, 0);
    expect(pieces).toBeGreaterThan(10);
    expect(centres.length).toBe(built.layout.marks.filter((m) => !m.underGnomon).length + pieces);
    const layer = dump.layerTable.find((l) => l.name === 'MARK_CENTRE_NO_CUT')!;
    expect(layer.on).toBe(false);
    expect(layer.plot).toBe(0);
  });

  it('gives the same outlines on a second run (byte-stable)', async () => {
    const again = await strokeOutlines(strokes, spec.cutFiles.chordTolerance);
    expect(JSON.stringify(again)).toBe(JSON.stringify(outlines));
    expect(readFileSync(join(dir, 'plate.dxf'), 'utf8')).toBe(new TextDecoder().decode((await buildFiles(spec)).files.find((f) => f.name === 'plate.dxf')!.bytes));
  });
});
