// "New sketch" makes a record at once (the Slate edits a stored sketch), so a sketch left
// without anything drawn, typed or pasted would pile up as an empty record. The Slate of a new
// sketch is opened as /sketches/<id>?fresh=1, so that a reload of the page still knows it is new;
// such a sketch still empty when its Slate closes is removed (hooks/useDropIfEmpty.ts).
import { SlateGeometry, type SketchFields } from '@/shared/api/sketches';

/** The route parameter that marks the Slate of a sketch "New sketch" has just made. */
export const FRESH_PARAM = 'fresh';

/** Nothing drawn, pasted, typed, attached or shared. */
export function isEmptySketch(s: SketchFields): boolean {
  const d = s.diagram;
  const drawn = SlateGeometry.safeParse(d.geometry).data?.components.length ?? 0;
  return d.pd.length === 0 && d.unknots === 0 && d.strokes.length === 0 && drawn === 0
    && !s.title.trim() && !s.seenAt.trim() && !s.notes.trim() && s.tags.length === 0 && s.attachments.length === 0 && s.groupId === null;
}
