// The browser tests' probe (test/browser.test.ts, scripts/page-screenshot.ts):
// only attached when the page's address asks for it (`/?probe`). It watches
// the page's events (events.ts) and keeps what the tests wait for and read
// in window.umbrafab and on <body data-…>. The app never reads it.
import type { ApiError } from './api.ts';
import { onPageEvent } from './events.ts';
import type { SunView } from '../sunView.ts';

/** window.umbrafab */
export interface Probe {
  ready: boolean;
  /** from the probe's start (the script's) to the first drawn views, ms */
  loadMs: number | null;
  navigationToReadyMs: number | null;
  /** rounds of drawing the browser has painted */
  redraws: number;
  /** from the first change to the painted views, ms */
  lastRedrawMs: number | null;
  /** the parts of the last round that asked for views, ms */
  timings: { waitMs: number; viewRequestMs: number; faceMs: number; modelMs: number; sunMs: number; paintMs?: number } | null;
  /** view answers shown */
  builds: number;
  /** sun answers shown */
  suns: number;
  webgl: boolean;
  triangles: number;
  shadowTriangles3d: number;
  pxPerMm: number | null;
  lastError: ApiError | { readonly message: string } | null;
  sun: SunView | null;
  /** the build id whose file list is shown */
  filesReady: string | null;
  saved: number;
}

/** Attach the probe: window.umbrafab and the <body> marks. */
export function attachProbe(): Probe {
  const t0 = performance.now();
  const probe: Probe = {
    ready: false,
    loadMs: null,
    navigationToReadyMs: null,
    redraws: 0,
    lastRedrawMs: null,
    timings: null,
    builds: 0,
    suns: 0,
    webgl: false,
    triangles: 0,
    shadowTriangles3d: 0,
    pxPerMm: null,
    lastError: null,
    sun: null,
    filesReady: null,
    saved: 0,
  };
  (window as unknown as { umbrafab: Probe }).umbrafab = probe;
  // When the current round started and reached each step (performance.now()).
  let changeAt: number | null = null;
  let round: { start: number; view?: number; face?: number; model?: number } | null = null;
  let sunAt: number | null = null;
  const twoFrames = (then: () => void) => requestAnimationFrame(() => requestAnimationFrame(then));

  onPageEvent((e) => {
    const now = performance.now();
    switch (e.type) {
      case 'change':
        changeAt ??= now;
        break;
      case 'viewAsked':
        round = { start: now };
        break;
      case 'viewAnswered':
        probe.builds++;
        probe.lastError = e.error;
        if (round) round.view = now;
        if (e.id !== null) document.body.dataset.view = e.id;
        break;
      case 'faceDrawn':
        if (round) round.face = now;
        break;
      case 'scale':
        probe.pxPerMm = e.pxPerMm;
        break;
      case 'webgl':
        probe.webgl = true;
        break;
      case 'modelDrawn':
        probe.triangles = e.triangles;
        if (round) round.model = now;
        break;
      case 'sunShown':
        probe.suns++;
        if (e.sun) probe.sun = e.sun;
        break;
      case 'shadow3d':
        probe.shadowTriangles3d = e.triangles;
        break;
      case 'drawn': {
        sunAt = now;
        if (round?.view !== undefined && round.face !== undefined && round.model !== undefined) {
          const { start, view, face, model } = round;
          probe.timings = { waitMs: changeAt === null ? 0 : start - changeAt, viewRequestMs: view - start, faceMs: face - view, modelMs: model - face, sunMs: now - model };
        }
        round = null;
        // Two animation frames: the browser has laid out and painted the new views.
        twoFrames(() => {
          const painted = performance.now();
          if (changeAt !== null) {
            probe.lastRedrawMs = painted - changeAt;
            if (probe.timings) probe.timings.paintMs = painted - (sunAt ?? painted);
            changeAt = null;
          }
          probe.redraws++;
          document.body.dataset.redraws = String(probe.redraws);
        });
        break;
      }
      case 'files':
        probe.filesReady = e.id;
        document.body.dataset.files = e.id;
        break;
      case 'saved':
        probe.saved++;
        break;
      case 'ready':
        twoFrames(() => {
          probe.loadMs = performance.now() - t0;
          probe.navigationToReadyMs = performance.now();
          probe.ready = true;
          document.body.dataset.ready = 'true';
        });
        break;
      case 'failed':
        probe.lastError = { message: e.message };
        break;
    }
  });
  return probe;
}
