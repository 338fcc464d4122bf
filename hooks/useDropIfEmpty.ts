// Removes a sketch started with "New sketch" when its Slate closes with nothing in it
// (lib/slate/fresh.ts). Anything drawn on the Slate keeps it at once, so a drawing still on its
// way to the store is never lost; the title and other details are read from the store, so a
// reopened fresh sketch (a reload) that has something in it is kept as well.
import { useEffect, useRef } from 'react';
import { isEmptySketch } from '@/lib/slate/fresh';
import { useSlate } from '@/lib/slate/slate-store';
import { useDevice } from './useDevice';

export function useDropIfEmpty(id: string, fresh: boolean) {
  const device = useDevice();
  const store = useRef(device?.store);
  store.current = device?.store ?? store.current;
  useEffect(() => {
    if (!fresh) return;
    const drawn = (s: ReturnType<typeof useSlate.getState>) => s.sketchId === id && s.history.present.sketch.components.length > 0;
    if (drawn(useSlate.getState())) return;
    let kept = false;
    const stop = useSlate.subscribe((s) => {
      if (!drawn(s)) return;
      kept = true;
      stop();
    });
    return () => {
      stop();
      if (kept) return;
      const s = store.current;
      void s?.get(id).then((sketch) => (sketch && !sketch.deleted && isEmptySketch(sketch) ? s.remove(id) : undefined));
    };
  }, [id, fresh]);
}
