#!/usr/bin/env node
// Runs the TypeScript CLI straight from source through tsx's ESM loader, so
// `pnpm exec umbrafab` works right after install with no build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/main.ts');
process.exitCode = await main(process.argv.slice(2));
