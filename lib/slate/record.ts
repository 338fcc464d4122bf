// Between the Slate and the stored sketch record: the drawing (shared/drawing's Sketch plus the
// chosen colours) is kept in diagram.geometry so it reopens exactly as left; the PD code,
// unknots and framings read from the analysis are what other screens and the server use; the
// smoothed paths go to diagram.strokes for thumbnails. A record with a PD code but no geometry
// (typed on another device, or forked) is laid out afresh.
import { SlateGeometry, type Diagram as StoredDiagram } from '@/shared/api/sketches';
import type { Analysis } from '@/shared/drawing/analyse';
import { emptySketch, type Sketch } from '@/shared/drawing/sketch';
import { closedBraidSketch, layoutPD, layoutToSketch } from '@/shared/layout';
import type { Diagram } from '@/shared/knot/diagram';

/** What the undo stack holds: the drawing and any colour a component was given by hand. */
export interface SlateDoc {
  readonly sketch: Sketch;
  /** Component id -> index into the chalk palette (absent: by drawing rank). */
  readonly colours: Readonly<Record<string, number>>;
}

export const emptyDoc: SlateDoc = { sketch: emptySketch, colours: {} };

const round = (x: number) => Math.round(x * 10) / 10;

export function toStoredDiagram(doc: SlateDoc, a: Analysis): StoredDiagram {
  const d = a.diagram?.diagram;
  const { sketch } = doc;
  return {
    pd: d ? d.pd.map((x) => [...x] as [number, number, number, number]) : [],
    unknots: d?.unknots ?? 0,
    framings: d ? [...d.framings] : [],
    strokes: sketch.components.map((c) => ({ points: c.points.map((p) => [round(p.x), round(p.y)] as [number, number]), closed: c.closed })),
    geometry: { components: sketch.components, flips: sketch.flips, nextSeq: sketch.nextSeq, colours: doc.colours, ...(sketch.bands?.length ? { bands: sketch.bands } : {}) },
  };
}

/**
 * A knot-core diagram as an editable drawing (its PD code read back is the same diagram).
 * Throws when the layout finds no picture that reads back as the same diagram: a distorted
 * picture would make the Readout show another link's invariants. Given its standard picture
 * (already checked, shared/layout), that is drawn; given the braid word it came from (and no
 * framings to show), it is drawn as that closed braid when the picture reads back right
 * (shared/layout/closed-braid.ts).
 */
export function docFromDiagram(d: Diagram, braid?: readonly number[], picture?: Sketch | null): SlateDoc {
  if (picture) return { sketch: picture, colours: {} };
  if (d.pd.length === 0 && d.unknots === 0) return emptyDoc;
  const closed = braid && d.unknots === 0 && d.framings.every((f) => f === null) ? closedBraidSketch(braid) : null;
  if (closed) return { sketch: closed, colours: {} };
  const layout = layoutPD(d.pd, d.unknots);
  if (!layout.faithful) {
    throw new Error('No faithful picture found for this code; the same link given as a braid word, or with fewer crossings, may draw.');
  }
  return { sketch: layoutToSketch(layout, d.framings), colours: {} };
}

/** The drawing as it was left on the Slate; null for a record without one (typed, or made elsewhere). */
export function drawnDoc(stored: StoredDiagram): SlateDoc | null {
  const g = SlateGeometry.safeParse(stored.geometry);
  if (!g.success) return null;
  const { colours = {}, ...sketch } = g.data;
  return { sketch, colours };
}

export function docFromStored(stored: StoredDiagram): SlateDoc {
  const drawn = drawnDoc(stored);
  if (drawn) return drawn;
  // A stored record is shown even if its picture is imperfect, so that it is never replaced by
  // an empty board; its stored PD code stays the record's truth until the user edits it.
  if (stored.pd.length === 0 && stored.unknots === 0) return emptyDoc;
  return { sketch: layoutToSketch(layoutPD(stored.pd, stored.unknots), stored.framings), colours: {} };
}
