// The page's own words and numbers for what the server sent: pure, no DOM,
// unit-tested beside. (Every dial number itself comes from the server.)
import type { SunView } from '../sunView.ts';

/** An SVG path of closed polygons (preview-SVG mm), 4 decimals; '' for none. */
export function shadowPathData(polys: readonly (readonly (readonly number[])[])[]): string {
  return polys.map((p) => p.map(([x, y], i) => `${i ? 'L' : 'M'}${x.toFixed(4)} ${y.toFixed(4)}`).join(' ') + ' Z').join(' ');
}

/** A file's size in the download list: bytes below 2 KiB, else KiB with one decimal. */
export const fileSizeText = (bytes: number): string => (bytes < 2048 ? `${bytes} B` : `${(bytes / 1024).toFixed(1)} KiB`);

/** The download list's summary line. */
export function filesStateText(files: readonly { readonly bytes: number }[]): string {
  const total = files.reduce((s, f) => s + f.bytes, 0);
  return `${files.length} files, ${(total / 1024).toFixed(1)} KiB`;
}

/** Minutes after midnight as the time input's 'HH:MM'. */
export const minutesToTime = (m: number): string => `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;

/** The time input's 'HH:MM' (or 'HH:MM:SS') as minutes after midnight; null while it is not a time. */
export function timeToMinutes(text: string): number | null {
  const [h, m] = text.split(':').map(Number);
  return Number.isFinite(h) && Number.isFinite(m) ? h * 60 + m : null;
}

/** 'HH:MM' of the time input (a browser may add seconds). */
export const queryTime = (text: string): string => text.slice(0, 5);

const SUN_STATE_WORDS: Readonly<Record<SunView['state'], string>> = {
  lit: 'the sun is on the face',
  behind: 'the sun is behind the face',
  below: 'the sun is below the horizon',
};

/** The line under the face: where the sun is and the moment. */
export function sunStateLine(s: SunView): string {
  return `${SUN_STATE_WORDS[s.state]} · ${s.query.date} · apparent ${s.apparent} · clock ${s.clock}${s.daylightSaving ? ' (summer time)' : ''}`;
}

/** The sun panel's rows. */
export function sunRows(s: SunView): { label: string; value: string }[] {
  return [
    { label: 'hour angle', value: `${s.hourAngleDeg.toFixed(3)}°` },
    { label: 'declination', value: `${s.declinationDeg.toFixed(3)}°` },
    { label: 'altitude', value: `${s.altitudeDeg.toFixed(2)}°` },
    { label: 'local clock', value: `${s.clock}${s.daylightSaving ? ' summer' : ''}` },
    { label: 'apparent solar', value: s.apparent },
    { label: 'UTC', value: s.utc.replace('T', ' ').replace(/\.\d+Z$/, 'Z') },
  ];
}
