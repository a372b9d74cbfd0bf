/** What `umbrafab init` writes for each site field: `parseSpec` refuses it with a message saying so until it is edited. */
export const SITE_PLACEHOLDER = 'EDIT ME';

/**
 * Spec fields whose default follows other fields: left out of a spec, they
 * take a value computed from those fields (by `parseSpec`, or for the
 * engraving presets by the engraving writer), so writing the schema's plain
 * default instead would change the dial. The page shows them as derived
 * (current value and what it follows) and never writes them back; `umbrafab
 * init` writes them only as comments.
 *
 * A new field whose default follows another field is declared here (one
 * line) and left `.optional()` in its section, or given a zod default that
 * `parseSpec` overrides; `test/normaliser.test.ts` fails for any defaulted
 * field that is not listed here and yet changes the normalised spec when its
 * plain default is written out.
 */
export interface DerivedDefault {
  /** dotted spec path, e.g. "process.kerf" */
  readonly key: string;
  /** the fields it follows, dotted */
  readonly follows: readonly string[];
  /** what it is when left out, in one line */
  readonly rule: string;
}

const PRESET = (what: string) => `the engraving preset of plate.material (${what})`;

export const DERIVED_DEFAULTS: readonly DerivedDefault[] = [
  { key: 'gnomon.thickness', follows: ['plate.thickness', 'process.method', 'parts.gnomonFrom'], rule: 'plate.thickness when the gnomon is cut from the sheet (laser, waterjet, router); 3 mm when made separately (print)' },
  { key: 'marks.hour.width', follows: ['process.method'], rule: 'waterjet 2 mm (no line narrower than the jet); other methods 0.8 mm' },
  { key: 'marks.half.width', follows: ['process.method'], rule: 'waterjet 1.6 mm; other methods 0.6 mm' },
  { key: 'marks.quarter.width', follows: ['process.method'], rule: 'waterjet 1.2 mm; other methods 0.4 mm' },
  { key: 'parts.gnomonFrom', follows: ['process.method', 'gnomon.thickness'], rule: 'sheet for laser, waterjet and router (separate when gnomon.thickness differs from plate.thickness); separate for print' },
  { key: 'process.kerf', follows: ['process.method'], rule: 'laser 0.15 mm, waterjet 0.9 mm, router 3.175 mm (the tool), print 0 mm' },
  { key: 'process.clearance', follows: ['process.method'], rule: 'print 0.2 mm per side, other methods 0.1 mm' },
  { key: 'install.date', follows: ['calendar.year'], rule: 'April 1 of calendar.year' },
  { key: 'pictures.date', follows: ['site.latitude', 'calendar.year', 'face.side'], rule: 'the local summer solstice of calendar.year (June 21 north, December 21 south; the winter one for an equatorial lower face)' },
  { key: 'engrave.tool.flatMinWidthMm', follows: ['engrave.tool.flatEndMillMm'], rule: 'the flat end mill diameter' },
  { key: 'engrave.spindleRpm', follows: ['plate.material'], rule: PRESET('rev/min') },
  { key: 'engrave.feedMmPerMin', follows: ['plate.material'], rule: PRESET('mm/min') },
  { key: 'engrave.plungeMmPerMin', follows: ['plate.material'], rule: PRESET('mm/min') },
  { key: 'engrave.stepDownMm', follows: ['plate.material'], rule: PRESET('mm') },
  { key: 'engrave.laserPowerPct', follows: ['plate.material'], rule: PRESET('%') },
  { key: 'engrave.laserSpeedMmPerMin', follows: ['plate.material'], rule: PRESET('mm/min') },
];

const BY_KEY = new Map(DERIVED_DEFAULTS.map((d) => [d.key, d]));

/** The derived-default entry of a dotted field, if its default follows another field. */
export function derivedDefault(key: string): DerivedDefault | undefined {
  return BY_KEY.get(key);
}
