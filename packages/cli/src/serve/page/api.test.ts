import { afterEach, describe, expect, it, vi } from 'vitest';
import { RequestLane, SUPERSEDED, answerOf, debounced, serverApi } from './api.ts';

/** A request that waits for `release` and honours its abort signal as fetch does (rejecting with an AbortError). */
function pending<T>(signal: AbortSignal): { promise: Promise<T>; release: (v: T) => void } {
  let release!: (v: T) => void;
  const promise = new Promise<T>((ok, fail) => {
    release = ok;
    signal.addEventListener('abort', () => fail(new DOMException('The operation was aborted.', 'AbortError')));
  });
  return { promise, release };
}

describe('RequestLane: only the latest request counts', () => {
  it('aborts the request in flight when a newer one starts, and gives SUPERSEDED for it', async () => {
    const lane = new RequestLane();
    const signals: AbortSignal[] = [];
    const releases: ((v: string) => void)[] = [];
    const start = () =>
      lane.run((signal) => {
        signals.push(signal);
        const p = pending<string>(signal);
        releases.push(p.release);
        return p.promise;
      });
    const first = start();
    expect(lane.busy).toBe(true);
    const second = start();
    expect(signals[0].aborted).toBe(true);
    expect(signals[1].aborted).toBe(false);
    releases[1]('second answer');
    expect(await first).toBe(SUPERSEDED);
    expect(await second).toBe('second answer');
    expect(lane.busy).toBe(false);
  });

  it('gives SUPERSEDED for an answer that arrived just before a newer start (it is not shown)', async () => {
    const lane = new RequestLane();
    let resolveFirst!: (v: string) => void;
    const first = lane.run(() => new Promise<string>((ok) => (resolveFirst = ok)));
    resolveFirst('stale'); // settled, but its continuation has not run yet
    const second = lane.run(async () => 'fresh');
    expect(await first).toBe(SUPERSEDED);
    expect(await second).toBe('fresh');
  });

  it('passes on a failure that is not an abort', async () => {
    const lane = new RequestLane();
    await expect(lane.run(async () => Promise.reject(new TypeError('network down')))).rejects.toThrow('network down');
    expect(lane.busy).toBe(false);
  });

  it('cancel aborts the request in flight; a lane with nothing in flight cancels nothing', async () => {
    const lane = new RequestLane();
    lane.cancel();
    let seen: AbortSignal | undefined;
    const run = lane.run((signal) => {
      seen = signal;
      return pending<number>(signal).promise;
    });
    lane.cancel();
    expect(seen?.aborted).toBe(true);
    expect(await run).toBe(SUPERSEDED);
    expect(lane.busy).toBe(false);
  });
});

describe('debounced', () => {
  afterEach(() => vi.useRealTimers());

  it('runs once, `ms` after the last schedule; cancel drops it', () => {
    vi.useFakeTimers();
    const action = vi.fn();
    const d = debounced(action, 60);
    d.schedule();
    vi.advanceTimersByTime(50);
    d.schedule();
    vi.advanceTimersByTime(59);
    expect(action).not.toHaveBeenCalled();
    vi.advanceTimersByTime(1);
    expect(action).toHaveBeenCalledTimes(1);
    d.schedule();
    d.cancel();
    vi.advanceTimersByTime(1000);
    expect(action).toHaveBeenCalledTimes(1);
  });
});

describe('serverApi and answerOf', () => {
  it('posts the form values as JSON with the signal, to the route the server answers', async () => {
    const calls: { url: string; init?: RequestInit }[] = [];
    const fetcher = (async (url: string, init?: RequestInit) => {
      calls.push({ url, init });
      return new Response(JSON.stringify({ ok: true, id: 'abc' }), { status: 200 });
    }) as unknown as typeof fetch;
    const api = serverApi(fetcher);
    const signal = new AbortController().signal;
    const r = await api.sun({ 'site.latitude': 40 }, { date: '2027-03-20', time: '15:00', kind: 'apparent' }, signal);
    expect(r.ok).toBe(true);
    expect(calls[0].url).toBe('/api/sun');
    expect(calls[0].init?.method).toBe('POST');
    expect(calls[0].init?.signal).toBe(signal);
    expect(JSON.parse(String(calls[0].init?.body))).toEqual({ fields: { 'site.latitude': 40 }, date: '2027-03-20', time: '15:00', kind: 'apparent' });
    await api.save({ name: 'x' }, true);
    expect(JSON.parse(String(calls[1].init?.body))).toEqual({ fields: { name: 'x' }, preview: true });
    await api.save({ name: 'x' }, false);
    expect(JSON.parse(String(calls[2].init?.body))).toEqual({ fields: { name: 'x' } });
    await api.files('/api/files/0123456789abcdef', signal);
    expect(calls[3]).toEqual({ url: '/api/files/0123456789abcdef', init: { signal } });
  });

  it('turns a body that is not JSON into a refusal naming the HTTP status', async () => {
    const r = await answerOf(new Response('<html>gateway</html>', { status: 502, statusText: 'Bad Gateway' }));
    expect(r).toEqual({ ok: false, error: { field: null, message: '502 Bad Gateway' } });
  });

  it("passes the server's refusal on as it is", async () => {
    const body = { ok: false, error: { field: 'site.latitude', message: 'site.latitude: got 95; allowed: a number from -90° to 90°' } };
    expect(await answerOf(new Response(JSON.stringify(body), { status: 422 }))).toEqual(body);
  });
});
