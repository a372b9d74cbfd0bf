import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

/** Debian's chromium (apt package `chromium`); a test tool's own browser download does not work on this machine (shared/DEPS.md). */
export const CHROMIUM = '/usr/bin/chromium';

/**
 * Launch Debian's chromium headless with the flags shared/DEPS.md lists for
 * this machine (no GPU, no background networking, a fresh profile folder)
 * and return a context with downloads allowed. `close()` also removes the
 * profile folder.
 */
export async function launchChromium(viewport = { width: 1440, height: 900 }): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), 'umbrafab-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    acceptDownloads: true,
    viewport,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      // WebGL on the CPU (SwiftShader) for the 3D view: there is no GPU here.
      '--enable-unsafe-swiftshader',
      '--use-angle=swiftshader',
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
