// One sketch on the Slate: header, toolbar, canvas and Readout (placed by SlateLayout), the
// dialogs, keyboard shortcuts, and saving to the device store.
import { useCallback, useMemo, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useFocusEffect, useIsFocused } from 'expo-router';
import { alternatingFlips, isDescending } from '@/shared/drawing/alternate';
import { analyse } from '@/shared/drawing/analyse';
import type { LocalSketch } from '@/lib/store/types';
import { braidToText, pdToText } from '@/shared/text/codes';
import { diagramNumbers, drawingNumbers } from '@/lib/slate/picture';
import { docFromStored } from '@/lib/slate/record';
import { braidOf, currentDoc, useSlate } from '@/lib/slate/slate-store';
import { useReadout } from '@/hooks/useReadout';
import { useSInvariant } from '@/hooks/useSInvariant';
import { useSlateActions } from '@/hooks/useSlateActions';
import { useSlateAutosave } from '@/hooks/useSlateAutosave';
import { useSlateShortcuts } from '@/hooks/useSlateShortcuts';
import { useSlateBands } from '@/hooks/useSlateBands';
import { useIsWide } from '@/components/shell/useIsWide';
import { Readout } from '@/components/readout/Readout';
import { ReadoutActions } from '@/components/readout/ReadoutActions';
import { BandsReadout } from '@/components/readout/BandsReadout';
import { DescendingNote } from './DescendingNote';
import { SlateCanvas } from './SlateCanvas';
import { SlateDialogs, type OpenDialog } from './SlateDialogs';
import { SlateHeader } from './SlateHeader';
import { SlateLayout } from './SlateLayout';
import { SelectionBar, Toolbar } from './Toolbar';
import { BandBar } from './BandBar';
import { AfterBandsView } from './AfterBandsView';
import { colors } from '@/constants/theme';

export function SlateScreen({ sketch }: { sketch: LocalSketch }) {
  const wide = useIsWide();
  const focused = useIsFocused();
  const ready = useSlate((s) => s.sketchId === sketch.id) && focused;
  // The Slate's state is one store: the screen in focus owns it (a stack may hold several). It
  // opens the record as stored when the screen takes focus; the autosave's own writes to the
  // record must not open it again.
  const stored = useRef(sketch.diagram);
  stored.current = sketch.diagram;
  useFocusEffect(
    useCallback(() => {
      if (useSlate.getState().sketchId !== sketch.id) useSlate.getState().open(sketch.id, docFromStored(stored.current));
    }, [sketch.id]),
  );
  useSlateAutosave(ready ? sketch.id : null);

  const doc = useSlate(currentDoc);
  const dragging = useSlate((s) => s.preview !== null);
  const braid = useSlate(braidOf);
  const analysis = useMemo(() => analyse(doc.sketch), [doc.sketch]);
  const diagram = analysis.diagram?.diagram ?? null;
  const readout = useReadout(ready ? diagram : null, dragging);
  const sInvariant = useSInvariant(ready ? diagram : null, dragging);
  const bands = useSlateBands(ready, dragging);
  const showAfter = useSlate((s) => s.showAfter) && bands.drawings !== null;
  const [open, setOpen] = useState<OpenDialog>(null);
  const actions = useSlateActions(sketch, doc, analysis, () => setOpen(null));

  const paste = useCallback(() => setOpen('paste'), []);
  useSlateShortcuts(paste, ready && open === null);

  const numbers = useMemo(() => drawingNumbers(doc), [doc]);
  const numberOf = useCallback((id: string) => numbers.get(id) ?? null, [numbers]);
  const componentNumbers = useMemo(() => diagramNumbers(doc, analysis), [doc, analysis]);
  const descending = useMemo(() => isDescending(analysis), [analysis]);
  // Only asked of a descending drawing: whether Alternate would change any crossing.
  const alternating = useMemo(() => descending && !!alternatingFlips(analysis)?.every((flip) => !flip), [descending, analysis]);
  const onFraming = (id: string) => setOpen({ framing: id });

  const empty = diagram ? null : analysis.markers.length ? 'markers' : analysis.open.length ? 'open' : 'nothing';
  const readoutPane = (
    <>
      {descending && diagram ? <DescendingNote components={diagram.framings.length} alternating={alternating} onAlternate={actions.alternateNow} /> : null}
      <Readout state={readout} s={sInvariant} empty={empty} markers={analysis.markers} openStrands={analysis.open.length} numbers={componentNumbers} />
      {diagram ? <BandsReadout state={bands.certificate} presentation={bands.presentation} refused={bands.refused} s={sInvariant} signature={readout.values.signature} /> : null}
      <ReadoutActions
        hasDiagram={!!diagram}
        canAlternate={!!diagram && diagram.pd.length > 0}
        onAlternate={actions.alternateNow}
        hasBraid={!!braid}
        message={actions.message}
        onCopyPD={() => diagram && void actions.copy(pdToText(diagram.pd), 'PD code')}
        onCopyBraid={() => braid && void actions.copy(braidToText(braid), 'braid word')}
        onPaste={() => setOpen('paste')}
        onFamilies={() => setOpen('families')}
        onSimplify={actions.simplifyNow}
        onRun={actions.startRun}
        onExport={(k, c) => void actions.exportAs(k, c)}
      />
    </>
  );

  if (!ready) return <View style={styles.root} />;
  return (
    <View style={styles.root}>
      <SlateLayout
        header={<SlateHeader sketch={sketch} onDetails={() => setOpen('details')} onShare={() => setOpen('share')} />}
        toolbar={<Toolbar />}
        canvas={(
          <>
            {showAfter && !wide ? null : <SlateCanvas analysis={analysis} onFraming={onFraming} />}
            {showAfter ? <AfterBandsView drawings={bands.drawings} /> : null}
          </>
        )}
        bars={(
          <>
            <SelectionBar numberOf={numberOf} onFraming={onFraming} />
            <BandBar afterComponents={bands.afterComponents} refused={bands.refused} />
          </>
        )}
        readout={readoutPane}
      />
      <SlateDialogs open={open} onClose={() => setOpen(null)} sketch={sketch} doc={doc} analysis={analysis} readout={readout} numberOf={numberOf} onDraw={actions.draw} />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
});
