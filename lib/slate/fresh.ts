// "New sketch" makes a record at once (the Slate edits a stored sketch), so a sketch left
// without anything drawn, typed or pasted would pile up as an empty record. The sketches started
// here stay "fresh" until something is drawn on them; a fresh sketch still empty when its Slate
// closes is removed (hooks/useDropIfEmpty.ts).
import { SlateGeometry, type SketchFields } from '@/shared/api/sketches';

const fresh = new Set<string>();

export const markFresh = (id: string) => void fresh.add(id);
export const isFresh = (id: string) => fresh.has(id);
/** Drawn on, or closed: never removed by the Slate after this. */
export const settle = (id: string) => void fresh.delete(id);

/** Nothing drawn, pasted, typed, attached or shared. */
export function isEmptySketch(s: SketchFields): boolean {
  const d = s.diagram;
  const drawn = SlateGeometry.safeParse(d.geometry).data?.components.length ?? 0;
  return d.pd.length === 0 && d.unknots === 0 && d.strokes.length === 0 && drawn === 0
    && !s.title.trim() && !s.seenAt.trim() && !s.notes.trim() && s.tags.length === 0 && s.attachments.length === 0 && s.groupId === null;
}
