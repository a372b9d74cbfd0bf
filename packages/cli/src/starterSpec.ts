import { METHOD_DEFAULTS } from '@umbrafab/geometry';

/**
 * The commented starter spec written by `umbrafab init`. The site is a
 * placeholder of our own (an invented harbour village); every other value is
 * the schema's default, spelled out so a maker sees what can be changed.
 * @param year the calendar year to write (the CLI passes the coming year)
 */
export function starterSpecYaml(year: number): string {
  const laser = METHOD_DEFAULTS.laser;
  return `# umbrafab dial spec: one polar sundial, everything in mm and degrees.
# Change the site first; every other line shows its default.

name: "Harbour Steps dial"      # engraved in the title block (1-60 characters)

site:
  latitude: 43.55               # degrees, north positive (-90 to 90)
  longitude: -5.92              # degrees, east positive (-180 to 180)
  timezone: "Europe/Madrid"     # IANA zone name; its standard meridian sets the longitude correction
  # place: "Harbour Steps"      # optional place name for the title block

dial:
  reads: solar                  # solar (apparent solar time) or standard (lines moved to the zone meridian)
  numerals: arabic              # arabic (7..12..5), arabic24 (7..17) or roman
  numeralHeight: 8              # mm; reduced automatically if neighbours would touch
  textHeight: 3.5               # mm, title block

gnomon:
  height: 50                    # mm, style edge above the dial face
  thickness: 3                  # mm, the fin's thickness (both edges cast shadows)
  overhang: 5                   # mm of style beyond the hour marks at each end
  tabs: 2                       # tabs through the plate
  tabLength: 15                 # mm per tab

hours:
  from: "07:00"                 # first mark
  to: "17:00"                   # last mark
  step: 15                      # minutes: 60, 30 or 15
  maxHourAngle: 75              # degrees; a polar dial cannot show |hour angle| >= 90

marks:                          # lengths along the style and line widths, mm
  hour: { length: 80, width: 0.8 }
  half: { length: 55, width: 0.6 }
  quarter: { length: 30, width: 0.4 }

plate:
  width: auto                   # mm or auto (sized to the hours, numerals and margins)
  length: auto                  # mm or auto
  margin: 12                    # mm clear border
  thickness: 3                  # mm sheet
  material: aluminium           # aluminium, brass, stainless, steel, acrylic, hardwood, plywood, slate, pla, petg
  cornerRadius: 4               # mm

holes:
  count: 4                      # 0, 2 (sides) or 4 (corners)
  diameter: 5.5                 # mm (clears M5)
  inset: 10                     # mm from the plate edges to the hole centres

calendar:
  year: ${year}                    # year of the time tables; outputs never depend on today's date

process:
  method: laser                 # laser, waterjet, router or print
  kerf: ${laser.kerf}                    # mm cut width (defaults: laser 0.15, waterjet 0.9, router 3.175, print 0)
  clearance: ${laser.clearance}                # mm fit clearance per side for the gnomon tabs
`;
}
