import { describe, expect, it } from 'vitest';
import { serializeGcode, serializeProgram, type GcodeRecord } from './gcodeRecords.ts';

// serializeProgram must give serializeGcode's bytes exactly (batch writes one body under many headers).
describe('serializeProgram', () => {
  const body: GcodeRecord[] = [
    { kind: 'modal', words: 'G21 G90' },
    { kind: 'feed', to: { x: 1, y: 2 }, feedMmPerMin: 300 },
    { kind: 'feed', to: { x: 3.14159 }, feedMmPerMin: 300 },
    { kind: 'end' },
  ];
  for (const percent of [false, true]) {
    it(`matches serializeGcode under two headers, percent ${percent}`, () => {
      for (const title of ['latitude 30', 'latitude 41.5']) {
        const header: GcodeRecord[] = [{ kind: 'comment', text: 'job' }, { kind: 'comment', text: title }];
        expect(serializeProgram(header, body, 3, { percent })).toBe(serializeGcode([...header, ...body], 3, { percent }));
      }
    });
  }
  it('matches serializeGcode for an empty header or body and a header with modal words', () => {
    expect(serializeProgram([], body, 3)).toBe(serializeGcode(body, 3));
    expect(serializeProgram([{ kind: 'comment', text: 'x' }], [], 3, { percent: true })).toBe(serializeGcode([{ kind: 'comment', text: 'x' }], 3, { percent: true }));
    const modal: GcodeRecord[] = [{ kind: 'feed', to: { x: 0 }, feedMmPerMin: 300 }];
    expect(serializeProgram(modal, body, 3)).toBe(serializeGcode([...modal, ...body], 3));
  });
});
