/**
 * Layer names of the cutting drawings (plate.dxf, gnomon.dxf, sheet.dxf),
 * one per operation (docs/design.md §5). Plain constants here so both the
 * writers (fabricate) and the readers of a drawing (the shadow check, which
 * cannot import fabricate) use the same names.
 *
 * - CUT_PROFILE: through-cuts (outer profiles, holes, slots).
 * - LINE_SCORE: engraved centre-lines (laser score, V-bit, print grooves).
 * - LINE_ETCH_OUTLINE: closed outlines of every engraved stroke at its width
 *   (waterjet etch, laser fill).
 * - TEXT_ENGRAVE: single-stroke numerals and text.
 * - REFERENCE_NO_CUT: checking lines, notes and part names; off and
 *   non-plotting in every drawing.
 * - MARK_CENTRE_NO_CUT: the marks' centre-lines when the marks are drawn as
 *   etch outlines (read back by `umbrafab check --plate`); off and
 *   non-plotting.
 * - the same four engraving layers with `_LOWER` before any `_NO_CUT`: an
 *   equatorial plate's lower face (face.side both), drawn as seen from
 *   below once the plate is turned over about its flip axis; the layers
 *   without it are then the upper face's.
 */
export const CUT_LAYER_NAMES = {
  cut: 'CUT_PROFILE',
  score: 'LINE_SCORE',
  etch: 'LINE_ETCH_OUTLINE',
  text: 'TEXT_ENGRAVE',
  reference: 'REFERENCE_NO_CUT',
  markCentres: 'MARK_CENTRE_NO_CUT',
  scoreLower: 'LINE_SCORE_LOWER',
  etchLower: 'LINE_ETCH_OUTLINE_LOWER',
  textLower: 'TEXT_ENGRAVE_LOWER',
  markCentresLower: 'MARK_CENTRE_LOWER_NO_CUT',
} as const;

export type CutLayerKey = keyof typeof CUT_LAYER_NAMES;
