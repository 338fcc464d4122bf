// The Slate's local UI state: the open sketch's undo/redo history, the tool, the selection, the
// view (zoom and pan) and a drag preview. A drag changes only `preview`; lifting the finger
// commits once, so one gesture is one undo step and nothing heavy runs mid-drag.
import { create } from 'zustand';
import { canRedo, canUndo, commit, historyOf, redo, undo, type History } from '@/shared/drawing/history';
import { emptyDoc, type SlateDoc } from './record';
import { refit, type FitBase } from './zoom';

export type Tool = 'draw' | 'flip' | 'move' | 'reshape' | 'bands';

export interface View {
  /** screen = world * k + (x, y) */
  readonly k: number;
  readonly x: number;
  readonly y: number;
}

export const identityView: View = { k: 1, x: 0, y: 0 };

export interface SlateState {
  sketchId: string | null;
  history: History<SlateDoc>;
  /** The document as it was opened (what the store already holds). */
  opened: SlateDoc;
  /** The document while a drag is in progress (not yet in the history). */
  preview: SlateDoc | null;
  tool: Tool;
  selected: string | null;
  /** The band whose controls are open (Bands tool). */
  selectedBand: string | null;
  /** Why the last band drawn was refused, until the next band gesture. */
  bandNotice: string | null;
  /** Show the drawing after the band moves instead of (or beside) the drawing. */
  showAfter: boolean;
  view: View;
  /** The canvas size last seen. */
  size: { width: number; height: number };
  /** What the last fit framed, until a gesture zooms or pans by hand: the view is fitted again when the canvas width changes. */
  fitBase: FitBase | null;
  /** The braid word the sketch came from, while it is unchanged since (for "copy braid word"). */
  braid: { word: number[]; doc: SlateDoc } | null;
  /** Bumped when a document arrives from outside (load, paste, family), to refit the view. */
  fitRequest: number;
  /** The last fitRequest the canvas honoured (a remounted canvas keeps the view). */
  fitted: number;
  open(id: string | null, doc: SlateDoc): void;
  /** Replace the drawing from a code or family (one undo step); the view refits. */
  replace(doc: SlateDoc, braid?: number[]): void;
  apply(doc: SlateDoc): void;
  setPreview(doc: SlateDoc | null): void;
  undo(): void;
  redo(): void;
  setTool(tool: Tool): void;
  select(id: string | null): void;
  selectBand(id: string | null): void;
  setBandNotice(notice: string | null): void;
  setShowAfter(show: boolean): void;
  setView(view: View): void;
  resize(width: number, height: number): void;
  /** Refit the view to the drawing. */
  fit(): void;
  /** The canvas fitted the view for this request. */
  markFitted(request: number, base: FitBase): void;
}

export const useSlate = create<SlateState>((set) => ({
  sketchId: null,
  history: historyOf(emptyDoc),
  opened: emptyDoc,
  preview: null,
  tool: 'draw',
  selected: null,
  selectedBand: null,
  bandNotice: null,
  showAfter: false,
  view: identityView,
  size: { width: 0, height: 0 },
  braid: null,
  fitRequest: 0,
  fitted: -1,
  fitBase: null,
  open: (sketchId, doc) =>
    set((s) => ({ sketchId, history: historyOf(doc), opened: doc, view: identityView, preview: null, selected: null, selectedBand: null, bandNotice: null, showAfter: false, braid: null, tool: 'draw', fitRequest: s.fitRequest + 1, fitBase: null })),
  replace: (doc, braid) =>
    set((s) => ({ history: commit(s.history, doc), preview: null, selected: null, braid: braid ? { word: braid, doc } : null, fitRequest: s.fitRequest + 1 })),
  apply: (doc) => set((s) => ({ history: commit(s.history, doc), preview: null })),
  setPreview: (preview) => set({ preview }),
  undo: () => set((s) => ({ history: undo(s.history), preview: null })),
  redo: () => set((s) => ({ history: redo(s.history), preview: null })),
  setTool: (tool) => set({ tool }),
  select: (selected) => set({ selected }),
  selectBand: (selectedBand) => set({ selectedBand }),
  setBandNotice: (bandNotice) => set({ bandNotice }),
  setShowAfter: (showAfter) => set({ showAfter }),
  setView: (view) => set({ view, fitBase: null }),
  resize: (width, height) =>
    set((s) => {
      if (s.size.width === 0) return { size: { width, height } };
      // A new width is the window's (or a pane beside the board): refit. A new height alone is
      // mostly a bar under the board coming or going, where a jump in scale would distract; and
      // after a hand zoom the user's view stays. Then the drawing's centre stays where it was.
      if (s.fitBase && width !== s.size.width) return { size: { width, height }, view: refit(s.fitBase, width, height) };
      const dx = (width - s.size.width) / 2;
      const dy = (height - s.size.height) / 2;
      return { size: { width, height }, view: { ...s.view, x: s.view.x + dx, y: s.view.y + dy } };
    }),
  fit: () => set((s) => ({ fitRequest: s.fitRequest + 1 })),
  markFitted: (fitted, fitBase) => set((s) => ({ fitted, fitBase, view: refit(fitBase, s.size.width, s.size.height) })),
}));

/** What the canvas draws: the drag preview if any, else the present. */
export const currentDoc = (s: SlateState): SlateDoc => s.preview ?? s.history.present;
export const undoable = (s: SlateState) => canUndo(s.history);
export const redoable = (s: SlateState) => canRedo(s.history);
/** The braid word is still the sketch's only while nothing was edited after it was pasted. */
export const braidOf = (s: SlateState): number[] | null => (s.braid && s.braid.doc === s.history.present ? s.braid.word : null);
