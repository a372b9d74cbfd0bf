// Writes docs/images/page.png (the dial page on the demo spec) and
// docs/images/page-wall.png (on the declining wall fixture), sun at 14:30
// apparent solar time in mid-April, in Debian's headless chromium.
// Run: npx tsx scripts/page-screenshot.ts
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { startServer } from '@umbrafab/cli';
import { launchChromium } from '../test/browserChromium.ts';

// page.evaluate functions run in the browser; the project compiles without the DOM library.
declare const window: any;
declare const document: any;

const ROOT = resolve(import.meta.dirname, '..');
const SHOTS = [
  ['fixtures/demo.yaml', 'docs/images/page.png'],
  ['fixtures/planar/wall-declining.yaml', 'docs/images/page-wall.png'],
] as const;

process.chdir(ROOT);
for (const [specPath, file] of SHOTS) await shoot(specPath, join(ROOT, file));

async function shoot(specPath: string, OUT: string): Promise<void> {
  const server = await startServer({ specPath, port: 0, log: () => {} });
  const { context, close } = await launchChromium({ width: 1440, height: 900 });
  try {
    const page = await context.newPage();
    const problems: string[] = [];
    page.on('pageerror', (e) => problems.push(String(e)));
    page.on('console', (m) => m.type() === 'error' && problems.push(m.text()));
    await page.goto(`${server.url}?probe`);
    await page.waitForFunction(() => (window as any).umbrafab?.ready === true, null, { timeout: 60_000 });
    // The download list of the spec on show (the full build runs in the server's worker).
    await page.waitForFunction(() => document.body.dataset.files !== undefined && document.body.dataset.files === document.body.dataset.view, null, { timeout: 60_000 });
    await page.waitForTimeout(300); // one more frame for the face texture in the 3D view
    mkdirSync(join(ROOT, 'docs/images'), { recursive: true });
    await page.screenshot({ path: OUT });
    const probe = await page.evaluate(() => (window as any).umbrafab);
    console.log(`page-screenshot: wrote ${OUT}; page ready in ${Math.round(probe.loadMs)} ms, WebGL ${probe.webgl}, ${probe.triangles} triangles`);
    if (problems.length) console.log(`page-screenshot: page reported: ${problems.join(' | ')}`);
  } finally {
    await close();
    await server.close();
  }
}
