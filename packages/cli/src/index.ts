/**
 * @umbrafab/cli as a library: the command line (`main`), the one path from
 * spec to files (`buildFiles`), spec and plate readers, and the local page's
 * server with its form helpers. The bin (`bin/umbrafab.js`) runs the built
 * copy of `main` (dist/); tests and scripts import these sources by name.
 */
export { EXIT, main, type Io } from './main.ts';
export { buildAnyFiles, buildContext, buildFiles, GENERATOR, type BuildResult } from './buildFiles.ts';
export type { BuildContext, Producer, ProducerResult } from './outputs/outputTypes.ts';
export type { PolarReport, Report } from './outputs/report.ts';
export type { PlanarReport } from './outputs/planarReport.ts';
export { MAX_SPEC_ALIASES, MAX_SPEC_BYTES, MAX_SPEC_DEPTH, MAX_SPEC_NODES, parseSpecText, readSpecFile, readSpecText } from './readSpec.ts';
export { parsePlateDxf, readPlateDxf, type PlateDxf } from './readPlateDxf.ts';
export { entryExists, OutputError, recoverInterrupted, writeFilesAtomic, type OutputFile } from './writeFilesAtomic.ts';
export { UsageError } from './commands/commandTypes.ts';
export { starterSpecYaml } from './starterSpec.ts';
export { startServer, type RunningServer, type ServeOptions } from './serve/startServer.ts';
export { buildCache, MAX_CACHED_FILE_BYTES, specId, type BuildCache, type CachedBuild } from './serve/buildCache.ts';
export { fullBuilder, WORKER_IDLE_MS, type FullBuilder } from './serve/fullBuilder.ts';
export { bindPolicy, DEFAULT_HOST, DEFAULT_PORT, isLoopbackHost } from './serve/bindPolicy.ts';
export { formValuesToSpec, specToFormValues, type FormValue } from './serve/formValues.ts';
export { MAX_BODY_BYTES, readJsonBody } from './serve/readJsonBody.ts';
export { specFields, unitOf, type SpecField } from './serve/specFields.ts';
export { specToCommentedYaml } from './serve/specYaml.ts';
export { summaryRows } from './serve/summaryRows.ts';
