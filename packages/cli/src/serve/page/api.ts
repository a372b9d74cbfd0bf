// The page's calls to its server (handleRequest.ts), typed by the server's
// own answer types. A kind of request of which only the latest matters runs
// on a RequestLane: starting one aborts the one before.
import type { FileListAnswer, Refusal, SaveAnswer, SetupAnswer, SunAnswer, ViewAnswer } from '../handleRequest.ts';
import type { FormValue } from '../formValues.ts';
import type { SunQuery } from '../sunView.ts';

/** A success answer as the page reads it: `ok` is true (the server's inferred types say boolean). */
export type Ok<T> = T extends unknown ? Omit<T, 'ok'> & { readonly ok: true } : never;
/** What a call gives: the answer, or the server's (or the network's) refusal. */
export type Answer<T> = Ok<T> | Refusal;
export type { Refusal };
export type ApiError = Refusal['error'];

export type Setup = Ok<SetupAnswer>;
export type View = Ok<ViewAnswer>;
export type FileList = Ok<FileListAnswer>;
export type Sun = Ok<SunAnswer>;
export type Save = Ok<SaveAnswer>;
export type FormValues = Readonly<Record<string, FormValue>>;

/** The answer's JSON, or a refusal naming the HTTP status when the body is not JSON. An abort propagates (see RequestLane). */
export async function answerOf<T>(res: Response): Promise<Answer<T>> {
  try {
    return (await res.json()) as Answer<T>;
  } catch (e) {
    if (e instanceof DOMException && e.name === 'AbortError') throw e;
    return { ok: false, error: { field: null, message: `${res.status} ${res.statusText}` } };
  }
}

/** The server's routes; `fetcher` is the browser's fetch (a stand-in in unit tests). */
export function serverApi(fetcher: typeof fetch = (input, init) => fetch(input, init)) {
  const post = async <T>(path: string, body: unknown, signal?: AbortSignal): Promise<Answer<T>> =>
    answerOf<T>(await fetcher(path, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body), signal }));
  const get = async <T>(path: string, signal?: AbortSignal): Promise<Answer<T>> => answerOf<T>(await fetcher(path, { signal }));
  return {
    setup: () => get<SetupAnswer>('/api/setup'),
    view: (fields: FormValues, signal?: AbortSignal) => post<ViewAnswer>('/api/view', { fields }, signal),
    sun: (fields: FormValues, query: SunQuery, signal?: AbortSignal) => post<SunAnswer>('/api/sun', { fields, ...query }, signal),
    files: (url: string, signal?: AbortSignal) => get<FileListAnswer>(url, signal),
    save: (fields: FormValues, preview: boolean) => post<SaveAnswer>('/api/save', preview ? { fields, preview: true } : { fields }),
  };
}
export type ServerApi = ReturnType<typeof serverApi>;

/** What a lane gives for a request a newer one took over. */
export const SUPERSEDED: unique symbol = Symbol('superseded');
export type Superseded = typeof SUPERSEDED;

/**
 * One kind of request of which only the latest matters (the views of the
 * current fields, the sun at the chosen moment, the file list). `run` aborts
 * the request before it (its fetch stops; the server's answer is not
 * waited for) and gives SUPERSEDED for any request that was overtaken, also
 * one whose answer had already arrived.
 */
export class RequestLane {
  private current: AbortController | null = null;

  /** Start `request` with a fresh signal, aborting the one in flight. */
  async run<T>(request: (signal: AbortSignal) => Promise<T>): Promise<T | Superseded> {
    this.cancel();
    const controller = new AbortController();
    this.current = controller;
    try {
      const answer = await request(controller.signal);
      return controller.signal.aborted ? SUPERSEDED : answer;
    } catch (e) {
      if (controller.signal.aborted) return SUPERSEDED;
      throw e;
    } finally {
      if (this.current === controller) this.current = null;
    }
  }

  /** Abort the request in flight, if any. */
  cancel(): void {
    this.current?.abort();
    this.current = null;
  }

  /** true while a request started here has not finished */
  get busy(): boolean {
    return this.current !== null;
  }
}

/**
 * `action` once `ms` have passed without another `schedule` (the form's
 * typing, the sun slider's drags); `cancel` drops a pending one.
 */
export function debounced(action: () => void, ms: number): { schedule: () => void; cancel: () => void } {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const cancel = () => {
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
  };
  return {
    schedule: () => {
      cancel();
      timer = setTimeout(() => {
        timer = undefined;
        action();
      }, ms);
    },
    cancel,
  };
}
