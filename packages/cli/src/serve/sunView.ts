import {
  DEG,
  SpecError,
  parseClock,
  parseLocalDate,
  sunAtClock,
  sunAtHourAngle,
  sunTrack,
  type DialLayout,
  type SunTrack,
  type Vec2,
  type Vec3,
} from '@umbrafab/geometry';
import { faceShadowPolygons, sunInFaceFrame, type SunLayout } from './shadowSource.ts';

/** Which clock the page's time control reads. */
export type TimeKind = 'apparent' | 'clock';

/** The page's date/time control. */
export interface SunQuery {
  /** local date 'YYYY-MM-DD' */
  readonly date: string;
  /** 'HH:MM' */
  readonly time: string;
  /** apparent: local apparent solar time (hour angle 15°·(T − 12 h)); clock: the local clock, daylight saving as in force */
  readonly kind: TimeKind;
}

/** The sun at the chosen moment and the gnomon's shadow on the face: all numbers from the geometry package. */
export interface SunView {
  readonly query: SunQuery;
  readonly utc: string;
  /** local clock time 'HH:MM:SS', with daylight saving when in force */
  readonly clock: string;
  readonly daylightSaving: boolean;
  /** local apparent solar time 'HH:MM:SS' (12 h + hour angle / 15°) */
  readonly apparent: string;
  readonly hourAngleDeg: number;
  readonly declinationDeg: number;
  readonly altitudeDeg: number;
  /** unit vector toward the sun, world frame (X east, Y north, Z up) */
  readonly sunWorld: Vec3;
  /** the same in the face frame (x across, y toward the pole, z out of the face) */
  readonly sunFace: Vec3;
  /** lit: the sun shines on the face; behind: it is above the horizon but behind the face plane; below: night */
  readonly state: 'lit' | 'behind' | 'below';
  /** the gnomon's shadow on the face plane, face coordinates (mm), one polygon per piece; empty unless lit */
  readonly shadowFace: readonly (readonly Vec2[])[];
}

const tracks = new Map<string, SunTrack>();

/**
 * The sun for the page's time control, through the same code as
 * `umbrafab check` and the assembly picture: a year's `sunTrack` for the
 * site (kept per site and year), `sunAtHourAngle` for an apparent time or
 * `sunAtClock` for a clock time, and the shadow of the layout's gnomon on
 * the face.
 * @throws SpecError naming `date` or `time` for a bad value
 */
export function sunView(layout: SunLayout, query: SunQuery): SunView {
  const day = parseLocalDate(query.date, 'date');
  const minutes = parseClock('time', query.time, { seconds: true });
  if (query.kind !== 'apparent' && query.kind !== 'clock') throw new SpecError('time kind', query.kind, 'allowed: "apparent" or "clock"');
  const { site } = layout.spec;
  const track = trackFor(site.latitude, site.longitude, site.timezone, day.year);
  const m = query.kind === 'apparent' ? sunAtHourAngle(track, query.date, (minutes / 60 - 12) * 15 * DEG) : sunAtClock(track, query.date, minutes);
  const s = m.sun;
  const sunFace = sunInFaceFrame(layout, s.enu);
  const state = s.altitudeRad <= 0 ? 'below' : sunFace[2] <= 0 ? 'behind' : 'lit';
  return {
    query,
    utc: new Date(Math.round(m.utcMs)).toISOString(),
    clock: m.clock,
    daylightSaving: m.daylightSaving,
    apparent: m.apparent,
    hourAngleDeg: s.hourAngleRad / DEG,
    declinationDeg: s.declinationRad / DEG,
    altitudeDeg: s.altitudeRad / DEG,
    sunWorld: s.enu,
    sunFace,
    state,
    shadowFace: state === 'lit' ? faceShadowPolygons(layout, sunFace) : [],
  };
}

function trackFor(latitudeDeg: number, longitudeDeg: number, timezone: string, year: number): SunTrack {
  const key = JSON.stringify([latitudeDeg, longitudeDeg, timezone, year]);
  let t = tracks.get(key);
  if (!t) {
    t = sunTrack({ latitudeDeg, longitudeDeg, timezone, year });
    tracks.set(key, t);
    while (tracks.size > 8) tracks.delete(tracks.keys().next().value as string);
  }
  return t;
}
