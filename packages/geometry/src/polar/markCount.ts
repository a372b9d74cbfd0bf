/**
 * The one count of a face's marks, shared by build, the page, install.md and
 * check: every time the face shows, counted once. On a solar-time dial noon
 * is a band as wide as the gnomon (docs/design.md §2): its two lines lie under
 * the fin's faces (`underGnomon`) and are not engraved, so noon counts as one
 * mark that is not engraved, and check measures only the engraved ones.
 */
export interface MarkCount {
  /** times the face shows (distinct labels) */
  readonly marks: number;
  /** of those, the times engraved (a line off the fin) */
  readonly engraved: number;
  /** labels all of whose lines lie under the gnomon (the noon band of a solar dial) */
  readonly underGnomon: readonly string[];
}

/**
 * Count the marks of a layout.
 * @example countMarks(layout.marks) // { marks: 33, engraved: 32, underGnomon: ['12:00'] } for 08:00–16:00 every 15 min, solar time
 */
export function countMarks(marks: readonly { readonly label: string; readonly underGnomon?: true }[]): MarkCount {
  const all = new Set(marks.map((m) => m.label));
  const engraved = new Set(marks.filter((m) => !m.underGnomon).map((m) => m.label));
  return { marks: all.size, engraved: engraved.size, underGnomon: [...all].filter((l) => !engraved.has(l)) };
}

/** "33 marks (12:00 is the noon band under the gnomon, not engraved)", or "33 marks". */
export function markCountText(count: MarkCount): string {
  const base = `${count.marks} mark${count.marks === 1 ? '' : 's'}`;
  if (count.underGnomon.length === 0) return base;
  return `${base} (${count.underGnomon.join(', ')} ${count.underGnomon.length === 1 ? 'is' : 'are'} the noon band under the gnomon, not engraved)`;
}
