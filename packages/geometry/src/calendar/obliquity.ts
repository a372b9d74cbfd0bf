/**
 * Mean obliquity of the ecliptic at J2000.0, radians: ε0 = 84381.406″
 * (IAU 2006 precession, Capitaine et al. 2003, adopted by IAU 2006
 * Resolution B1; memory) = 23.4392794°. Checked in the test against
 * astronomy-engine's own mean obliquity at J2000 (`e_tilt(…).mobl`).
 */
export const OBLIQUITY_J2000_RAD = ((84381.406 / 3600) * Math.PI) / 180;
