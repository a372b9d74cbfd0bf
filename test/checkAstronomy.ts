/**
 * astronomy-engine for the check tests in test/: it is a dependency of
 * @umbrafab/geometry, not of the workspace root, so the root test folder
 * reaches it through the geometry package (named imports only, DEPS.md).
 */
export { Body, Equator, Horizon, MakeTime, Observer, SearchHourAngle, Seasons } from '../packages/geometry/node_modules/astronomy-engine';
