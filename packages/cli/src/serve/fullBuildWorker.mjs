// Worker entry for fullBuilder.ts: registers tsx's TypeScript loader in this
// thread (as bin/umbrafab.js does for the CLI), then loads the worker itself.
import { register } from 'tsx/esm/api';

register();
await import('./fullBuildWorker.ts');
