// Removes a sketch started with "New sketch" when its Slate closes with nothing in it
// (lib/slate/fresh.ts). Anything drawn on the Slate settles it at once, so a drawing still on
// its way to the store is never lost; the title and other details are read from the store.
import { useEffect, useRef } from 'react';
import { isEmptySketch, isFresh, settle } from '@/lib/slate/fresh';
import { useSlate } from '@/lib/slate/slate-store';
import { useDevice } from './useDevice';

export function useDropIfEmpty(id: string) {
  const device = useDevice();
  const store = useRef(device?.store);
  store.current = device?.store ?? store.current;
  useEffect(() => {
    if (!isFresh(id)) return;
    const drawn = (s: ReturnType<typeof useSlate.getState>) => s.sketchId === id && s.history.present.sketch.components.length > 0;
    if (drawn(useSlate.getState())) return settle(id);
    const stop = useSlate.subscribe((s) => drawn(s) && (settle(id), stop()));
    return () => {
      stop();
      if (!isFresh(id)) return;
      settle(id);
      const s = store.current;
      void s?.get(id).then((sketch) => (sketch && !sketch.deleted && isEmptySketch(sketch) ? s.remove(id) : undefined));
    };
  }, [id]);
}
