// The Slate's dialogs, one open at a time: paste a code, Families, the sketch's details, Share,
// and a component's framing (with the blackboard framing the Readout found, when it has it).
import type { Analysis } from '@/shared/drawing/analyse';
import { setFraming, type Sketch } from '@/shared/drawing/sketch';
import type { Diagram } from '@/shared/knot/diagram';
import type { SlateDoc } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';
import type { LocalSketch } from '@/lib/store/types';
import type { ReadoutState } from '@/hooks/useReadout';
import { PasteCodeDialog } from '@/components/readout/PasteCodeDialog';
import { FamiliesDialog } from '@/components/readout/FamiliesDialog';
import { Dialog } from '@/components/ui/Dialog';
import { FramingDialog } from './FramingDialog';
import { SketchDetails } from './SketchDetails';
import { ShareControl } from './ShareControl';

export type OpenDialog = null | 'paste' | 'families' | 'details' | 'share' | { framing: string };

interface Props {
  open: OpenDialog;
  onClose: () => void;
  sketch: LocalSketch;
  doc: SlateDoc;
  analysis: Analysis;
  readout: ReadoutState;
  numberOf: (id: string) => number | null;
  onDraw: (d: Diagram, word?: number[], picture?: Sketch | null) => void;
}

export function SlateDialogs({ open, onClose, sketch, doc, analysis, readout, numberOf, onDraw }: Props) {
  const diagram = analysis.diagram?.diagram ?? null;
  const framingId = open && typeof open === 'object' ? open.framing : null;
  const framingComponent = framingId ? doc.sketch.components.find((c) => c.id === framingId) : undefined;
  const framingIndex = framingId ? analysis.diagram?.componentIds.indexOf(framingId) ?? -1 : -1;
  const blackboard = framingIndex >= 0 && readout.values.framings && !readout.stale.has('framings') && framingComponent?.framing === null
    ? readout.values.framings[framingIndex]?.value ?? null : null;
  return (
    <>
      <PasteCodeDialog visible={open === 'paste'} onClose={onClose} onDraw={onDraw} />
      <FamiliesDialog visible={open === 'families'} onClose={onClose} current={diagram} onDraw={onDraw} />
      <SketchDetails sketch={sketch} visible={open === 'details'} onClose={onClose} />
      <Dialog title="Share to a group" visible={open === 'share'} onClose={onClose}>
        <ShareControl sketch={sketch} />
      </Dialog>
      <FramingDialog
        visible={!!framingComponent}
        number={framingId ? numberOf(framingId) : null}
        framing={framingComponent?.framing ?? null}
        blackboard={blackboard}
        onClose={onClose}
        onSet={(f) => {
          const s = useSlate.getState();
          s.apply({ ...s.history.present, sketch: setFraming(s.history.present.sketch, framingId!, f) });
          onClose();
        }}
      />
    </>
  );
}
