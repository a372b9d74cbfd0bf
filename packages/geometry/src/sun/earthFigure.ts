/**
 * astronomy-engine 2.1.19's figure of the Earth, the constants
 * EARTH_EQUATORIAL_RADIUS_KM and EARTH_FLATTENING of its source (not
 * exported), used by its `terra()` observer position: the IERS 2003
 * equatorial radius and the ratio of the polar to the equatorial radius.
 * Kept equal to the library's so our observer positions match its own.
 */
export const EARTH_EQUATORIAL_RADIUS_KM = 6378.1366;
export const EARTH_FLATTENING = 0.996647180302104;
