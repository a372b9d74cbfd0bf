// What the page tells an observer as it works: the one hook between the app
// and anything watching it (the browser tests' probe, probe.ts). The app
// emits; nothing in the app reads an event back.
import type { ApiError } from './api.ts';
import type { SunView } from '../sunView.ts';

export type PageEvent =
  /** a field or a sun control changed (a redraw is coming) */
  | { readonly type: 'change' }
  /** the views were asked for */
  | { readonly type: 'viewAsked' }
  /** the views' answer: its build id, or the problem */
  | { readonly type: 'viewAnswered'; readonly id: string | null; readonly error: ApiError | null }
  /** the face, numbers and derived values are drawn */
  | { readonly type: 'faceDrawn' }
  /** the face's scale on screen */
  | { readonly type: 'scale'; readonly pxPerMm: number }
  /** the 3D view could start WebGL */
  | { readonly type: 'webgl' }
  /** the 3D assembly is drawn with this many triangles */
  | { readonly type: 'modelDrawn'; readonly triangles: number }
  /** the sun answer is shown (null: the server refused the moment) */
  | { readonly type: 'sunShown'; readonly sun: SunView | null }
  /** the shadow on the 3D face, in triangles */
  | { readonly type: 'shadow3d'; readonly triangles: number }
  /** this round of drawing is done (the browser paints it next) */
  | { readonly type: 'drawn' }
  /** the file list of build `id` is shown */
  | { readonly type: 'files'; readonly id: string }
  /** "save spec" wrote (or kept) the file */
  | { readonly type: 'saved' }
  /** the page has drawn its first views */
  | { readonly type: 'ready' }
  /** the page could not start */
  | { readonly type: 'failed'; readonly message: string };

type Listener = (e: PageEvent) => void;
const listeners: Listener[] = [];

/** Watch the page's events; returns the function that stops watching. */
export function onPageEvent(listener: Listener): () => void {
  listeners.push(listener);
  return () => {
    const i = listeners.indexOf(listener);
    if (i >= 0) listeners.splice(i, 1);
  };
}

export function emit(e: PageEvent): void {
  for (const l of listeners) l(e);
}
