// Writes docs/images/page.png: the dial page on the demo spec, sun at
// 14:30 apparent solar time in mid-April, in Debian's headless chromium.
// Run: npx tsx scripts/page-screenshot.ts
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { startServer } from '../packages/cli/src/serve/startServer.ts';
import { launchChromium } from '../test/browserChromium.ts';

const ROOT = resolve(import.meta.dirname, '..');
const OUT = join(ROOT, 'docs/images/page.png');

const server = await startServer({ specPath: join(ROOT, 'fixtures/demo.yaml'), port: 0, log: () => {} });
const { context, close } = await launchChromium({ width: 1440, height: 900 });
try {
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(String(e)));
  page.on('console', (m) => m.type() === 'error' && problems.push(m.text()));
  await page.goto(server.url);
  await page.waitForFunction(() => (window as any).umbrafab?.ready === true, null, { timeout: 60_000 });
  await page.waitForTimeout(500); // let the face texture settle in the 3D view
  mkdirSync(join(ROOT, 'docs/images'), { recursive: true });
  await page.screenshot({ path: OUT });
  const probe = await page.evaluate(() => (window as any).umbrafab);
  console.log(`page-screenshot: wrote ${OUT}; page ready in ${Math.round(probe.loadMs)} ms, WebGL ${probe.webgl}, ${probe.triangles} triangles`);
  if (problems.length) console.log(`page-screenshot: page reported: ${problems.join(' | ')}`);
} finally {
  await close();
  await server.close();
}
