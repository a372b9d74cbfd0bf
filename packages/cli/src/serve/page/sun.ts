// The sun controls (date, time, which clock, the time slider) and the
// sun's numbers; the shadow itself is drawn by face.ts and model.ts.
import type { SunQuery, SunView } from '../sunView.ts';
import { byId, fillList } from './dom.ts';
import { minutesToTime, queryTime, sunRows, sunStateLine, timeToMinutes } from './format.ts';

const date = () => byId('sun-date', HTMLInputElement);
const time = () => byId('sun-time', HTMLInputElement);
const kind = () => byId('sun-kind', HTMLSelectElement);
const slider = () => byId('sun-slider', HTMLInputElement);

/** The moment the controls show, as the server's /api/sun reads it. */
export function sunQuery(): SunQuery {
  return { date: date().value, time: queryTime(time().value), kind: kind().value as SunQuery['kind'] };
}

/** Set the controls to a day of `year` at 14:30, and call `onChange` after each change (the slider and the time box follow each other). */
export function initSunControls(year: string, onChange: () => void): void {
  date().value = `${year}-04-16`;
  time().value = '14:30';
  slider().value = String(14 * 60 + 30);
  const typed = () => {
    const m = timeToMinutes(time().value);
    if (m !== null) slider().value = String(m);
    onChange();
  };
  date().addEventListener('input', typed);
  time().addEventListener('input', typed);
  kind().addEventListener('change', typed);
  slider().addEventListener('input', () => {
    time().value = minutesToTime(Number(slider().value));
    onChange();
  });
}

/** The sun's state line and numbers. */
export function drawSunNumbers(s: SunView): void {
  byId('sun-state', HTMLElement).textContent = sunStateLine(s);
  fillList(byId('sun-numbers', HTMLElement), sunRows(s));
}

/** The server's refusal of the moment, in the state line. */
export function showSunProblem(message: string): void {
  byId('sun-state', HTMLElement).textContent = `umbrafab: ${message}`;
}
