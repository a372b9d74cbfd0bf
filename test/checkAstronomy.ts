/**
 * astronomy-engine for the check tests in test/ (a dev dependency of the
 * workspace root, the same version as @umbrafab/geometry's; named imports
 * only, DEPS.md).
 */
export { Body, Equator, Horizon, MakeTime, Observer, SearchHourAngle, Seasons, SiderealTime } from 'astronomy-engine';
