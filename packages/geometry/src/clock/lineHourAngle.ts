/**
 * The hour angle of the line for clock time T, degrees (docs/design.md §3): the
 * standard-time shift moves every line by λ − λs, so
 * H = 15°·(T − 12 h) + shift, shift = λ − λs for a standard-time dial and 0
 * for a solar one; rounded to 1e-9° so noon is exactly 0 and byte-stable.
 *
 * @param minutes clock time, minutes after midnight
 * @param shiftDeg λ − λs (standard) or 0 (solar), degrees
 */
export function lineHourAngleDeg(minutes: number, shiftDeg: number): number {
  const r = Math.round((15 * (minutes / 60 - 12) + shiftDeg) * 1e9) / 1e9;
  return r === 0 ? 0 : r;
}
