// Saves the Slate's drawing to the device store right after each edit (never mid-drag: the
// history only changes when a gesture ends), so a reload or a closed tab straight after a stroke
// loses nothing; the outbox joins unsent writes (sync/SPEC.md S8a), so this costs no extra
// sync traffic. What is still waiting is saved when the screen closes or another sketch opens.
import { useEffect, useRef } from 'react';
import { analyse } from '@/shared/drawing/analyse';
import { useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { toStoredDiagram, type SlateDoc } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';

const saveDelayMs = 0;

export function useSlateAutosave(id: string | null) {
  const { update } = useSketchWrites();
  const present = useSlate((s) => (s.sketchId === id ? s.history.present : null));
  const saved = useRef<{ id: string; doc: SlateDoc } | null>(null);
  const pending = useRef<{ id: string; doc: SlateDoc } | null>(null);
  const write = useRef(update.mutate);
  write.current = update.mutate;

  const flush = () => {
    const p = pending.current;
    if (!p) return;
    pending.current = null;
    saved.current = p;
    write.current({ id: p.id, patch: { diagram: toStoredDiagram(p.doc, analyse(p.doc.sketch)) } });
  };

  useEffect(() => {
    // Another sketch took the Slate (or this one lost it): what waits is saved now.
    if (pending.current && (pending.current.id !== id || !present)) flush();
    if (!id || !present) return;
    if (saved.current?.id !== id) saved.current = { id, doc: useSlate.getState().opened };
    if (present === saved.current.doc) {
      // Undone back to what the store holds: nothing is waiting any more.
      pending.current = null;
      return;
    }
    pending.current = { id, doc: present };
    const t = setTimeout(flush, saveDelayMs);
    return () => clearTimeout(t);
  }, [id, present]);

  useEffect(() => () => flush(), []);
  return update;
}
