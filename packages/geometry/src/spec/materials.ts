/** Stock materials a spec may name (plate.material, stand.material); kept apart from schema.ts so the sections can import it. */
export const MATERIALS = ['aluminium', 'brass', 'stainless', 'steel', 'acrylic', 'hardwood', 'plywood', 'slate', 'pla', 'petg'] as const;
export type Material = (typeof MATERIALS)[number];
