import { copyFileSync, existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '@umbrafab/cli';
import { CHROMIUM, launchChromium } from './browserChromium.ts';
import { runCli } from './helpers/runCli.ts';

// The functions passed to page.evaluate run in the browser; the project compiles without the DOM library.
declare const window: any;
declare const document: any;

const ROOT = resolve(import.meta.dirname, '..');
const SOLAR = join(ROOT, 'fixtures/specs/serve-solar.yaml');

/** Wait until the page has redrawn after the last change (it counts its redraws on <body>), return the probe. */
async function redrawn(page: Page, before: number): Promise<any> {
  await page.waitForFunction((n) => Number(document.body.dataset.redraws ?? 0) > n, before, { timeout: 60_000 });
  // Settle: no change pending, no build or sun request left in flight.
  await page.waitForFunction(() => !document.getElementById('status')!.classList.contains('busy'), null, { timeout: 60_000 });
  return page.evaluate(() => ({ ...(window as any).umbrafab }));
}

const redraws = (page: Page) => page.evaluate(() => Number(document.body.dataset.redraws ?? 0));
const number = (page: Page, key: string) => page.locator(`#numbers dd[data-key="${key}"]`).innerText();

// In CI (CI set, as .ci/run installs chromium) a missing browser is a failure, not a silent skip.
const HAVE_CHROMIUM = existsSync(CHROMIUM);
describe('the browser tests can run', () => {
  it.runIf(!HAVE_CHROMIUM)(`finds ${CHROMIUM} (Debian chromium: apt-get install chromium)`, () => {
    if (process.env.CI) throw new Error(`${CHROMIUM} is missing: the browser tests need Debian's chromium (.ci/run installs it)`);
    console.warn(`browser tests skipped: ${CHROMIUM} is missing (they fail instead when CI is set)`);
  });
});

describe.skipIf(!HAVE_CHROMIUM)('the dial page in a real browser (Debian chromium, playwright-core)', () => {
  let dir: string;
  let specFile: string;
  let server: RunningServer;
  let browser: Awaited<ReturnType<typeof launchChromium>>;
  let page: Page;
  const problems: string[] = [];

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'umbrafab-page-'));
    specFile = join(dir, 'dial.yaml');
    copyFileSync(SOLAR, specFile);
    server = await startServer({ specPath: specFile, port: 0, log: () => {} });
    browser = await launchChromium({ width: 1440, height: 900 });
    page = await browser.context.newPage();
    page.on('pageerror', (e) => problems.push(String(e)));
    // A 422 answer is the page asking about a bad field on purpose (the bad-field test); anything else is a problem.
    page.on('console', (m) => m.type() === 'error' && !/status of 422/.test(m.text()) && problems.push(m.text()));
    const t0 = Date.now();
    await page.goto(server.url);
    await page.waitForFunction(() => (window as any).umbrafab?.ready === true, null, { timeout: 60_000 });
    const probe = await page.evaluate(() => ({ ...(window as any).umbrafab }));
    const nav = await page.evaluate(() => (performance as any).getEntriesByType('navigation')[0]?.toJSON());
    console.log(
      `page load: ${Date.now() - t0} ms from goto to ready (in-page: ${Math.round(probe.loadMs)} ms from script start to the first drawn views; DOMContentLoaded ${Math.round(nav?.domContentLoadedEventEnd ?? NaN)} ms); WebGL ${probe.webgl}, ${probe.triangles} triangles`,
    );
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('loads with the form, the face, the 3D assembly and the numbers, without errors', async () => {
    const probe = await page.evaluate(() => ({ ...(window as any).umbrafab }));
    expect(probe.ready).toBe(true);
    expect(await page.locator('#f-site-latitude').inputValue()).toBe('50.62');
    expect(await page.locator('#f-gnomon-height').inputValue()).toBe('50');
    expect(await page.locator('#face svg #lines path').count()).toBeGreaterThan(20);
    expect(probe.webgl).toBe(true);
    expect(probe.triangles).toBeGreaterThan(100);
    expect(await number(page, 'tilt')).toBe('50.62°');
    expect(problems).toEqual([]);
  });

  it('redraws the face and the numbers when the latitude and the gnomon height change', async () => {
    let n = await redraws(page);
    await page.locator('#f-site-latitude').fill('40');
    let probe = await redrawn(page, n);
    console.log(`field change → redrawn views (site.latitude): ${Math.round(probe.lastRedrawMs)} ms ${JSON.stringify(probe.timings)}`);
    expect(await number(page, 'tilt')).toBe('40°');
    expect(await page.locator('#face svg #text').innerHTML()).toContain('40.000N');
    const mark15Before = await page.locator('#face svg #lines path:has(title:text-is("15:00 east"))').getAttribute('d');

    n = await redraws(page);
    await page.locator('#f-gnomon-height').fill('40');
    probe = await redrawn(page, n);
    console.log(`field change → redrawn views (gnomon.height): ${Math.round(probe.lastRedrawMs)} ms ${JSON.stringify(probe.timings)}`);
    // The 45° check (common practice, docs/design.md §2): the 15:00 line lies t/2 + h from the centre plane.
    expect(await number(page, 'mark15')).toMatch(/^41\.5 mm/);
    expect(await number(page, 'gnomon')).toBe('40 mm × 3 mm');
    const mark15After = await page.locator('#face svg #lines path:has(title:text-is("15:00 east"))').getAttribute('d');
    expect(mark15After).not.toBe(mark15Before);
    expect(problems).toEqual([]);
  });

  it('shows the CLI\'s message beside a bad field', async () => {
    const n = await redraws(page);
    await page.locator('#f-site-latitude').fill('95');
    await redrawn(page, n);
    const err = page.locator('.field[data-key="site.latitude"] .err');
    expect(await err.innerText()).toBe('site.latitude: got 95; allowed: a number from -90° to 90°');
    const m = await redraws(page);
    await page.locator('#f-site-latitude').fill('40');
    await redrawn(page, m);
    expect(await err.isHidden()).toBe(true);
  });

  it('draws the 15:00 apparent-time shadow of an equinox on the 15:00 line, within one pixel', async () => {
    // March equinox 2027: 20 March (memory); the shadow's x does not depend on the declination for a straight style.
    const n = await redraws(page);
    await page.locator('#sun-kind').selectOption('apparent');
    await page.locator('#sun-date').fill('2027-03-20');
    await page.locator('#sun-time').fill('15:00');
    await redrawn(page, n);
    // The sun on show is the one asked for (each of the three inputs above may have redrawn on its own).
    await page.waitForFunction(() => {
      const q = (window as any).umbrafab.sun?.query;
      return q?.date === '2027-03-20' && q?.time === '15:00' && q?.kind === 'apparent';
    }, null, { timeout: 60_000 });
    const probe = await page.evaluate(() => ({ ...(window as any).umbrafab }));
    console.log(`time change → redrawn shadow: ${Math.round(probe.lastRedrawMs)} ms`);
    const m = await page.evaluate(() => {
      const svg = document.querySelector('#face svg') ;
      const mark = [...svg.querySelectorAll('#lines path')].find((p: any) => p.querySelector('title')?.textContent === '15:00 east') ;
      const shadow = svg.querySelector('#shadow') ;
      const markBox = mark.getBoundingClientRect();
      const shadowBox = shadow.getBoundingClientRect();
      const viewBoxWidth = svg.viewBox.baseVal.width;
      return { markCentrePx: markBox.left + markBox.width / 2, shadowEdgePx: shadowBox.right, pxPerMm: svg.getBoundingClientRect().width / viewBoxWidth, state: document.getElementById('sun-state')!.textContent };
    });
    const offPx = m.shadowEdgePx - m.markCentrePx;
    console.log(`15:00 shadow edge vs 15:00 line: ${offPx.toFixed(3)} px (${(offPx / m.pxPerMm).toFixed(4)} mm at ${m.pxPerMm.toFixed(3)} px/mm)`);
    expect(m.state).toMatch(/^the sun is on the face/);
    expect(Math.abs(offPx)).toBeLessThanOrEqual(1);
    expect(probe.shadowTriangles3d).toBeGreaterThan(0);
  });

  it('downloads plate.dxf byte for byte as `umbrafab build` writes it for the saved spec', async () => {
    // One edit of its own (the cases do not depend on each other's order), saved, built with the CLI, compared with the download.
    const n = await redraws(page);
    await page.locator('#f-gnomon-height').fill('40');
    await redrawn(page, n);
    await saveWithPage(page);
    const out = join(dir, 'cli');
    const cli = await runCli(['build', specFile, '--out', out, '--force']);
    expect(cli.code, cli.err).toBe(0);
    // The file list belongs to the spec on show (the page marks both with the build id).
    await page.waitForFunction(() => document.body.dataset.files !== undefined && document.body.dataset.files === document.body.dataset.view, null, { timeout: 60_000 });
    const [download] = await Promise.all([page.waitForEvent('download'), page.locator('#files a[data-file="plate.dxf"]').click()]);
    expect(download.suggestedFilename()).toBe('plate.dxf');
    const got = join(dir, 'downloaded-plate.dxf');
    await download.saveAs(got);
    const a = readFileSync(got);
    const b = readFileSync(join(out, 'plate.dxf'));
    expect(a.length).toBe(b.length);
    expect(a.equals(b)).toBe(true);
    expect(readFileSync(specFile, 'utf8')).toMatch(/^  height: 40$/m);
    expect(problems).toEqual([]);
  });
});

/** Click "save spec", agree to the listed changes if any, wait for the status line; returns the listed changes. */
async function saveWithPage(page: Page): Promise<string[]> {
  const saved = await page.evaluate(() => (window as any).umbrafab.saved ?? 0);
  await page.locator('#save').click();
  await page.waitForFunction(() => !document.getElementById('changes')!.hidden || /^nothing changed/.test(document.getElementById('status')!.textContent ?? ''), null, { timeout: 30_000 });
  const listed = await page.locator('#changes li').allInnerTexts();
  if (listed.length) {
    await page.locator('#save-confirm').click();
    await page.waitForFunction((k) => ((window as any).umbrafab.saved ?? 0) > k, saved, { timeout: 30_000 });
  }
  return listed;
}

describe.skipIf(!HAVE_CHROMIUM)('"save spec" in a real browser edits the user\'s file', () => {
  const SPEC = join(ROOT, 'fixtures/specs/page-router-thick.yaml');
  let server: RunningServer;
  let browser: Awaited<ReturnType<typeof launchChromium>>;
  let specFile: string;
  let page: Page;

  /** A fresh copy of the commented spec, a server and a page for each case: the cases run in any order. */
  async function open(): Promise<void> {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-save-'));
    specFile = join(dir, 'dial.yaml');
    copyFileSync(SPEC, specFile);
    server = await startServer({ specPath: specFile, port: 0, log: () => {} });
    page = await browser.context.newPage();
    await page.goto(server.url);
    await page.waitForFunction(() => (window as any).umbrafab?.ready === true, null, { timeout: 60_000 });
  }

  beforeAll(async () => {
    browser = await launchChromium({ width: 1280, height: 900 });
  });
  afterAll(async () => browser?.close());

  it('shows the derived defaults, and saving the unedited spec leaves the file byte for byte', async () => {
    await open();
    try {
      // 12 mm router sheet: the gnomon is cut from it, so its thickness is derived (12 mm), not a filled-in 3.
      expect(await page.locator('#f-gnomon-thickness').inputValue()).toBe('');
      expect(await page.locator('#f-gnomon-thickness').getAttribute('placeholder')).toBe('12 mm (derived)');
      expect(await page.locator('.field[data-key="process.kerf"] .derived').textContent()).toMatch(/^derived: 3\.175 mm now, follows process\.method/);
      const before = readFileSync(specFile);
      expect(await saveWithPage(page)).toEqual([]);
      expect(await page.locator('#status').innerText()).toMatch(/^nothing changed/);
      expect(readFileSync(specFile).equals(before)).toBe(true);
    } finally {
      await page.close();
      await server.close();
    }
  });

  it('saving one edited field changes that field\'s line only, comments kept', async () => {
    await open();
    try {
      const before = readFileSync(specFile, 'utf8');
      const n = await redraws(page);
      await page.locator('#f-gnomon-height').fill('64');
      await redrawn(page, n);
      expect(await saveWithPage(page)).toEqual(['gnomon.height: 60 → 64']);
      const after = readFileSync(specFile, 'utf8');
      const a = before.split('\n');
      const b = after.split('\n');
      expect(b.length).toBe(a.length);
      const changed = a.flatMap((line, i) => (line === b[i] ? [] : [[line, b[i]]]));
      expect(changed).toEqual([['  height: 60', '  height: 64']]);
      expect(after).toContain('method: router # kerf follows the tool');
    } finally {
      await page.close();
      await server.close();
    }
  });
});
