// One computation at a time in a web worker (bundled by Metro from new Worker(new URL(...))).
// Aborting a request that is still being computed stops its worker (the engines cannot be
// interrupted from outside), and the next request starts a fresh one.

export type WorkerMessage<T> = { type: 'done'; value: T } | { type: 'error'; message: string };

/** What a worker script posts back for one request. */
export function answer<T>(compute: () => T): WorkerMessage<T> {
  try {
    return { type: 'done', value: compute() };
  } catch (err) {
    return { type: 'error', message: err instanceof Error ? err.message : 'The computation failed' };
  }
}

export function workerCall<Req, Res>(make: () => Worker): (req: Req, signal: AbortSignal) => Promise<Res> {
  let worker: Worker | null = null;
  return (req, signal) => {
    const w = (worker ??= make());
    return new Promise((resolve, reject) => {
      const stop = () => {
        if (worker === w) worker = null;
        w.terminate();
      };
      const onAbort = () => {
        stop();
        reject(new Error('superseded'));
      };
      signal.addEventListener('abort', onAbort, { once: true });
      const settle = (done: () => void) => {
        signal.removeEventListener('abort', onAbort);
        done();
      };
      w.onmessage = (e: MessageEvent<WorkerMessage<Res>>) => {
        const m = e.data;
        settle(() => (m.type === 'done' ? resolve(m.value) : reject(new Error(m.message))));
      };
      w.onerror = (e) =>
        settle(() => {
          stop();
          reject(new Error(e.message || 'The on-device computation failed'));
        });
      w.postMessage(req);
    });
  };
}

/** Native: no web worker; the work runs after a frame, and a request aborted before it starts is never computed. */
export function afterFrame<Req, Res>(compute: (req: Req) => Res): (req: Req, signal: AbortSignal) => Promise<Res> {
  return (req, signal) =>
    new Promise((resolve, reject) => {
      setTimeout(() => {
        if (signal.aborted) return reject(new Error('superseded'));
        try {
          resolve(compute(req));
        } catch (err) {
          reject(err);
        }
      }, 0);
    });
}
