// A computation off the gesture path: nothing while a drag is in progress, then after a short
// pause, through `compute` (a web worker on the web). A newer input aborts the computation of the
// old one; its result stays visible, marked stale, until the new one arrives.
import { useEffect, useRef, useState } from 'react';

export interface Computed<T> {
  value?: T;
  error?: string;
  stale: boolean;
}

const debounceMs = 150;

export function useDeviceComputation<In, Out>(input: In | null, paused: boolean, compute: (input: In, signal: AbortSignal) => Promise<Out>): Computed<Out> {
  const [state, setState] = useState<Computed<Out>>({ stale: false });
  const computed = useRef<In | null>(null);

  useEffect(() => {
    if (input === computed.current) return;
    if (input === null) {
      computed.current = null;
      setState({ stale: false });
      return;
    }
    setState((s) => ({ ...s, stale: true }));
    if (paused) return;
    const abort = new AbortController();
    const settle = (next: Computed<Out>) => {
      if (abort.signal.aborted) return;
      computed.current = input;
      setState(next);
    };
    const timer = setTimeout(() => {
      compute(input, abort.signal).then(
        (value) => settle({ value, stale: false }),
        (e: unknown) => settle({ error: e instanceof Error ? e.message : String(e), stale: false }),
      );
    }, debounceMs);
    return () => {
      clearTimeout(timer);
      abort.abort();
    };
  }, [input, paused, compute]);

  return state;
}
