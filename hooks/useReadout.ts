// Runs the Readout's stages off the gesture path: nothing while a drag is in progress, then
// after a short pause, one stage per task so input events get through between them. Values
// from the previous diagram stay visible, marked stale, until their stage has run again.
import { useEffect, useRef, useState } from 'react';
import type { Diagram } from '@/shared/knot/diagram';
import { readoutStages, type ReadoutKey, type ReadoutValues } from '@/lib/slate/readout';

export interface ReadoutState {
  values: { [K in ReadoutKey]?: ReadoutValues[K] };
  stale: ReadonlySet<ReadoutKey>;
  errors: { [K in ReadoutKey]?: string };
}

const debounceMs = 120;
const allKeys = readoutStages.flatMap((s) => s.keys);

export function useReadout(diagram: Diagram | null, paused: boolean): ReadoutState {
  const [state, setState] = useState<ReadoutState>({ values: {}, stale: new Set(), errors: {} });
  const computed = useRef<Diagram | null>(null);

  useEffect(() => {
    if (diagram === computed.current) return;
    setState((s) => ({ ...s, stale: new Set(diagram ? allKeys : []) }));
    if (!diagram) {
      computed.current = null;
      setState({ values: {}, stale: new Set(), errors: {} });
      return;
    }
    if (paused) return;
    let cancelled = false;
    let timer: ReturnType<typeof setTimeout>;
    const values: ReadoutState['values'] = {};
    const errors: ReadoutState['errors'] = {};
    const runStage = (i: number) => {
      if (cancelled) return;
      if (i === readoutStages.length) {
        computed.current = diagram;
        return;
      }
      const stage = readoutStages[i];
      try {
        Object.assign(values, stage.run(diagram, values));
        stage.keys.forEach((k) => delete errors[k]);
      } catch (e) {
        stage.keys.forEach((k) => (errors[k] = e instanceof Error ? e.message : String(e)));
      }
      setState((s) => {
        const stale = new Set(s.stale);
        stage.keys.forEach((k) => stale.delete(k));
        return { values: { ...s.values, ...values }, stale, errors: { ...errors } };
      });
      timer = setTimeout(() => runStage(i + 1), 0);
    };
    timer = setTimeout(() => runStage(0), debounceMs);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [diagram, paused]);

  return state;
}
