import { describe, expect, it } from 'vitest';
import { runRs274 } from '../../../../test/helpers/rs274.ts';
import { ngcComment } from './ngcComment.ts';

describe('ngcComment', () => {
  it('transliterates to ASCII and removes parentheses', () => {
    expect(ngcComment('tilt 51.5° (north)')).toBe('tilt 51.5 deg [north]');
    expect(ngcComment('Zürich, −3′ ×2 µm')).toBe("Zurich, -3' x2 um");
    expect(ngcComment('a\tb\n\nc  (d(e))')).toBe('a b c [d[e]]');
    expect(ngcComment('日')).toBe('?');
  });

  it('defuses LinuxCNC message and logging comments', () => {
    expect(ngcComment('MSG, hello')).toBe('- MSG, hello');
    expect(ngcComment('logopen,file.txt')).toBe('- logopen,file.txt');
    expect(ngcComment('message: fine')).toBe('message: fine');
  });

  it('caps the length', () => {
    expect(ngcComment('x'.repeat(500)).length).toBe(200);
  });

  it('gives comments rs274 reads back as plain comments', () => {
    // Outside check: Debian's rs274 -g prints COMMENT("…") for each comment.
    const raw = ['tilt 51.5° (north)', 'MSG, hello', 'nested (a (b) c)', 'Zürich ±1″'];
    const { commands } = runRs274(`${raw.map((t) => `(${ngcComment(t)})`).join('\n')}\nM2\n`);
    const comments = commands.filter((c) => c.kind === 'COMMENT').map((c) => (c.kind === 'COMMENT' ? c.text : ''));
    expect(comments).toEqual(raw.map(ngcComment));
    expect(commands.some((c) => c.kind === 'MESSAGE')).toBe(false);
  });
});
