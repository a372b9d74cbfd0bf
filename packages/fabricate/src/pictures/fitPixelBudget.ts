/** Options of `fitPixelBudget`. */
export interface PixelBudget {
  /** most pixels one picture may have (its RGBA buffer is 4 bytes a pixel while it renders) */
  readonly maxPixels: number;
}

/**
 * Most pixels one rendered picture may have: 8 million (a 32 MiB RGBA buffer
 * while it renders). Measured on this project's machine, a build's peak RSS
 * grows by about 7 bytes per pixel of the pictures rendering at once; with
 * two pictures at this budget and a 3000 mm plate's 252-sheet template the
 * whole build stays under 512 MiB.
 */
export const MAX_PICTURE_PIXELS = 8_000_000;

/**
 * The resolution a picture of `widthMm` × `heightMm` is rendered at: the one
 * asked for when it fits the pixel budget, else the largest one that does,
 * rounded down to 0.01 px/mm (so the result is the same on every machine).
 * @returns `pxPerMm` to render at and `lowered` true when it is less than asked
 * @example fitPixelBudget(3000, 3000, 4) // { pxPerMm: 0.94, lowered: true }
 */
export function fitPixelBudget(widthMm: number, heightMm: number, pxPerMm: number, budget: PixelBudget = { maxPixels: MAX_PICTURE_PIXELS }): { pxPerMm: number; lowered: boolean } {
  const pixels = (ppm: number) => Math.max(1, Math.round(widthMm * ppm)) * Math.max(1, Math.round(heightMm * ppm));
  if (pixels(pxPerMm) <= budget.maxPixels) return { pxPerMm, lowered: false };
  let ppm = Math.floor(Math.sqrt(budget.maxPixels / (widthMm * heightMm)) * 100) / 100;
  while (ppm > 0.01 && pixels(ppm) > budget.maxPixels) ppm = Math.round((ppm - 0.01) * 100) / 100;
  return { pxPerMm: Math.max(0.01, ppm), lowered: true };
}
