// The Readout's s-invariant, computed off the gesture path: nothing while a drag is in
// progress, then after a short pause, in a web worker on the web (components/readout/computeS).
// A newer diagram aborts the computation of the old one; its value stays visible, marked stale.
import { useEffect, useRef, useState } from 'react';
import { componentCount, type Diagram } from '@/shared/knot/diagram';
import { computeS } from '@/components/readout/computeS';
import { S_MAX_CROSSINGS } from '@/components/readout/local-s';

export type SState =
  | { kind: 'none' }
  /** s is defined for knots here. */
  | { kind: 'link' }
  /** More crossings than the device computes (S_MAX_CROSSINGS). */
  | { kind: 'large'; crossings: number }
  | { kind: 'knot'; s?: number; error?: string; stale: boolean };

const debounceMs = 150;

export function useSInvariant(diagram: Diagram | null, paused: boolean): SState {
  const [state, setState] = useState<SState>({ kind: 'none' });
  const computed = useRef<Diagram | null>(null);

  useEffect(() => {
    if (diagram === computed.current) return;
    if (!diagram || componentCount(diagram) !== 1 || diagram.pd.length > S_MAX_CROSSINGS) {
      computed.current = diagram;
      setState(!diagram ? { kind: 'none' } : componentCount(diagram) !== 1 ? { kind: 'link' } : { kind: 'large', crossings: diagram.pd.length });
      return;
    }
    setState((s) => (s.kind === 'knot' ? { ...s, stale: true } : { kind: 'knot', stale: true }));
    if (paused) return;
    const abort = new AbortController();
    const timer = setTimeout(() => {
      computeS({ pd: diagram.pd, unknots: diagram.unknots }, abort.signal).then(
        (s) => {
          if (abort.signal.aborted) return;
          computed.current = diagram;
          setState({ kind: 'knot', s, stale: false });
        },
        (e: unknown) => {
          if (abort.signal.aborted) return;
          computed.current = diagram;
          setState({ kind: 'knot', error: e instanceof Error ? e.message : String(e), stale: false });
        },
      );
    }, debounceMs);
    return () => {
      clearTimeout(timer);
      abort.abort();
    };
  }, [diagram, paused]);

  return state;
}
