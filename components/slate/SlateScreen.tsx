// One sketch on the Slate: toolbar, canvas and Readout (below the canvas on a phone, a side
// pane on a wide screen), the dialogs, keyboard shortcuts, and saving to the device store.
import { useCallback, useEffect, useMemo, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { router, useFocusEffect, useIsFocused } from 'expo-router';
import * as Clipboard from 'expo-clipboard';
import { alternate, isDescending } from '@/shared/drawing/alternate';
import { analyse } from '@/shared/drawing/analyse';
import { setFraming, type Sketch } from '@/shared/drawing/sketch';
import { simplify } from '@/shared/knot/moves/simplify';
import type { Diagram } from '@/shared/knot/diagram';
import type { LocalSketch } from '@/lib/store/types';
import { braidToText, pdToText } from '@/shared/text/codes';
import { exportFiles, type ExportChoices } from '@/lib/slate/exports';
import { savePng } from '@/lib/slate/png';
import { diagramNumbers, drawingNumbers } from '@/lib/slate/picture';
import { docFromDiagram, docFromStored } from '@/lib/slate/record';
import { braidOf, currentDoc, useSlate } from '@/lib/slate/slate-store';
import { useReadout } from '@/hooks/useReadout';
import { useSInvariant } from '@/hooks/useSInvariant';
import { useSlateAutosave } from '@/hooks/useSlateAutosave';
import { useSlateShortcuts } from '@/hooks/useSlateShortcuts';
import { useSlateBands } from '@/hooks/useSlateBands';
import { useKnownGroups } from '@/hooks/queries/useLocalSketches';
import { useShortcutRegistry } from '@/components/shell/shortcuts';
import { saveText } from '@/components/ui/save';
import { useIsWide } from '@/components/shell/useIsWide';
import { Readout } from '@/components/readout/Readout';
import { ReadoutActions, type ExportKind } from '@/components/readout/ReadoutActions';
import { PasteCodeDialog } from '@/components/readout/PasteCodeDialog';
import { FamiliesDialog } from '@/components/readout/FamiliesDialog';
import { BandsReadout } from '@/components/readout/BandsReadout';
import { DescendingNote } from './DescendingNote';
import { SlateCanvas } from './SlateCanvas';
import { SplitToggle, canvasHeight, useSplit } from './SplitToggle';
import { SelectionBar, Toolbar } from './Toolbar';
import { BandBar } from './BandBar';
import { AfterBandsView } from './AfterBandsView';
import { FramingDialog } from './FramingDialog';
import { SketchDetails } from './SketchDetails';
import { Dialog } from '@/components/ui/Dialog';
import { ShareControl, sharedLabel, useRefusedShares } from './ShareControl';
import { colors, fonts, space, type } from '@/constants/theme';

type Open = null | 'paste' | 'families' | 'details' | 'share' | { framing: string };

export function SlateScreen({ sketch }: { sketch: LocalSketch }) {
  const wide = useIsWide();
  const { height } = useWindowDimensions();
  const focused = useIsFocused();
  const ready = useSlate((s) => s.sketchId === sketch.id) && focused;
  // The Slate's state is one store: the screen in focus owns it (a stack may hold several).
  useFocusEffect(
    useCallback(() => {
      if (useSlate.getState().sketchId !== sketch.id) useSlate.getState().open(sketch.id, docFromStored(sketch.diagram));
    }, [sketch.id]), // eslint-disable-line react-hooks/exhaustive-deps
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
  const [open, setOpen] = useState<Open>(null);
  const { reading, toggle: toggleSplit } = useSplit(); // phone: a shorter canvas, more Readout
  // A refused share (S24) shows beside the label, so the owner opens Share to read why.
  const shareRefused = useRefusedShares(sketch.id).length > 0 ? 'share refused by the server' : null;
  const shared = sharedLabel(sketch, useKnownGroups());
  const [message, setMessage] = useState<string | null>(null);
  useEffect(() => {
    if (!message) return;
    const t = setTimeout(() => setMessage(null), 4000);
    return () => clearTimeout(t);
  }, [message]);

  const paste = useCallback(() => setOpen('paste'), []);
  useSlateShortcuts(paste, ready && open === null);

  const numbers = useMemo(() => drawingNumbers(doc), [doc]);
  const numberOf = useCallback((id: string) => numbers.get(id) ?? null, [numbers]);
  const componentNumbers = useMemo(() => diagramNumbers(doc, analysis), [doc, analysis]);
  const descending = useMemo(() => isDescending(analysis), [analysis]);
  const alternateNow = () => {
    const s = useSlate.getState();
    const next = alternate(s.history.present.sketch);
    if (next === s.history.present.sketch || next.flips === s.history.present.sketch.flips) return setMessage('Already alternating.');
    s.apply({ ...s.history.present, sketch: next });
  };

  const draw = (d: Diagram, word?: number[], picture?: Sketch | null) => {
    try {
      useSlate.getState().replace(docFromDiagram(d, word, picture), word);
    } catch (e) {
      setMessage((e as Error).message);
    }
    setOpen(null);
  };
  const simplifyNow = () => {
    if (!diagram) return;
    const s = simplify(diagram);
    if (s.pd.length === diagram.pd.length) return setMessage('Nothing to simplify: no R1 kink or R2 bigon.');
    draw(s);
    setMessage(`Simplified from ${diagram.pd.length} to ${s.pd.length} crossings.`);
  };
  const copy = async (text: string, what: string) => {
    await Clipboard.setStringAsync(text);
    setMessage(`Copied the ${what}.`);
  };
  const exportAs = async (kind: ExportKind, choices: ExportChoices) => {
    const files = exportFiles(doc, analysis, sketch.title, choices);
    try {
      if (kind === 'png') setMessage(await savePng(files.pngName, files.svg.text));
      else setMessage(await saveText(files[kind].name, files[kind].text, files[kind].mime));
    } catch (e) {
      setMessage(e instanceof Error ? e.message : String(e));
    }
  };
  const startRun = () => diagram && router.push({ pathname: '/runs', params: { pd: pdToText(diagram.pd), sketchId: sketch.id } });

  const framingId = open && typeof open === 'object' ? open.framing : null;
  const framingComponent = framingId ? doc.sketch.components.find((c) => c.id === framingId) : undefined;
  const framingNumber = framingId ? numberOf(framingId) : null;
  const framingIndex = framingId ? analysis.diagram?.componentIds.indexOf(framingId) ?? -1 : -1;
  const blackboard = framingIndex >= 0 && readout.values.framings && !readout.stale.has('framings') && framingComponent?.framing === null
    ? readout.values.framings[framingIndex]?.value ?? null : null;

  const empty = diagram ? null : analysis.markers.length ? 'markers' : analysis.open.length ? 'open' : 'nothing';
  const readoutPane = (
    <>
      {descending ? <DescendingNote onAlternate={alternateNow} /> : null}
      <Readout state={readout} s={sInvariant} empty={empty} markers={analysis.markers} openStrands={analysis.open.length} numbers={componentNumbers} />
      {diagram ? <BandsReadout state={bands.certificate} refused={bands.refused} s={sInvariant} signature={readout.values.signature} /> : null}
      <ReadoutActions
        hasDiagram={!!diagram}
        canAlternate={!!diagram && diagram.pd.length > 0}
        onAlternate={alternateNow}
        hasBraid={!!braid}
        message={message}
        onCopyPD={() => diagram && void copy(pdToText(diagram.pd), 'PD code')}
        onCopyBraid={() => braid && void copy(braidToText(braid), 'braid word')}
        onPaste={() => setOpen('paste')}
        onFamilies={() => setOpen('families')}
        onSimplify={simplifyNow}
        onRun={startRun}
        onExport={(k, c) => void exportAs(k, c)}
      />
    </>
  );

  const header = (
    <View style={styles.header}>
      {!wide ? (
        <Pressable role="link" accessibilityLabel="Sketches" onPress={() => (router.canGoBack() ? router.back() : router.replace('/sketches'))} style={styles.back}>
          <Text style={styles.backText}>‹</Text>
        </Pressable>
      ) : null}
      <Pressable role="button" accessibilityLabel="Sketch details" onPress={() => setOpen('details')} style={styles.titleBox}>
        <Text role="heading" aria-level={1} style={styles.title} numberOfLines={1}>{sketch.title || 'Untitled sketch'}</Text>
        <Text style={styles.meta} numberOfLines={1}>{[shared, shareRefused, sketch.seenAt, sketch.tags.map((t) => `#${t}`).join(' ')].filter(Boolean).join(' · ') || 'Add a title, where it was seen, notes, a photo'}</Text>
      </Pressable>
      <View style={styles.headerActions}>
        {wide ? <Pressable role="button" accessibilityLabel="Keyboard shortcuts" onPress={() => useShortcutRegistry.getState().setSheet(true)} style={styles.quiet}><Text style={styles.quietText}>?</Text></Pressable> : null}
        <Pressable role="button" accessibilityLabel="Share" onPress={() => setOpen('share')} style={styles.quiet}><Text style={styles.quietText}>Share</Text></Pressable>
        <Pressable role="button" accessibilityLabel="Details" onPress={() => setOpen('details')} style={styles.quiet}><Text style={styles.quietText}>Details</Text></Pressable>
      </View>
    </View>
  );

  const board = (
    <>
      <Toolbar />
      <View style={wide ? styles.canvasWide : [styles.canvasPhone, { height: canvasHeight(height, reading) }]}>
        {showAfter && !wide ? null : <SlateCanvas analysis={analysis} onFraming={(id) => setOpen({ framing: id })} />}
        {showAfter ? <AfterBandsView drawings={bands.drawings} /> : null}
      </View>
      <SelectionBar numberOf={numberOf} onFraming={(id) => setOpen({ framing: id })} />
      <BandBar afterComponents={bands.afterComponents} refused={bands.refused} />
    </>
  );

  if (!ready) return <View style={styles.root} />;
  return (
    <View style={styles.root}>
      {wide ? (
        <View style={styles.split}>
          <View style={styles.main}>
            {header}
            {board}
          </View>
          <ScrollView style={styles.side} contentContainerStyle={styles.sideContent}>{readoutPane}</ScrollView>
        </View>
      ) : (
        // The board stays put (a page that scrolls would fight the drawing finger); the Readout scrolls below it.
        <View style={styles.main}>
          {header}
          {board}
          <SplitToggle reading={reading} onToggle={toggleSplit} />
          <ScrollView style={styles.main} contentContainerStyle={styles.phoneReadout} keyboardShouldPersistTaps="handled">{readoutPane}</ScrollView>
        </View>
      )}
      <PasteCodeDialog visible={open === 'paste'} onClose={() => setOpen(null)} onDraw={draw} />
      <FamiliesDialog visible={open === 'families'} onClose={() => setOpen(null)} current={diagram} onDraw={draw} />
      <SketchDetails sketch={sketch} visible={open === 'details'} onClose={() => setOpen(null)} />
      <Dialog title="Share to a group" visible={open === 'share'} onClose={() => setOpen(null)}>
        <ShareControl sketch={sketch} />
      </Dialog>
      <FramingDialog
        visible={!!framingComponent}
        number={framingNumber}
        framing={framingComponent?.framing ?? null}
        blackboard={blackboard}
        onClose={() => setOpen(null)}
        onSet={(f) => {
          const s = useSlate.getState();
          s.apply({ ...s.history.present, sketch: setFraming(s.history.present.sketch, framingId!, f) });
          setOpen(null);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  split: { flex: 1, flexDirection: 'row' },
  main: { flex: 1 },
  side: { width: 330, flexGrow: 0, borderLeftWidth: 1, borderLeftColor: colors.line, backgroundColor: colors.surface },
  sideContent: { padding: space.xl, gap: space.lg },
  phoneReadout: { padding: space.lg + 4, paddingBottom: space.xxxl, gap: space.lg },
  header: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.lg, paddingTop: space.md, paddingBottom: space.xs },
  back: { minHeight: 44, minWidth: 32, justifyContent: 'center', marginLeft: -space.xs },
  backText: { fontFamily: fonts.medium, fontSize: 30, lineHeight: 34, color: colors.accent },
  titleBox: { flex: 1, minWidth: 0 },
  title: { ...type.title, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
  headerActions: { flexDirection: 'row', gap: space.xs },
  quiet: { minHeight: 40, minWidth: 40, paddingHorizontal: space.md, alignItems: 'center', justifyContent: 'center', borderRadius: 10 },
  quietText: { ...type.label, color: colors.accent, fontSize: 15 },
  canvasWide: { flex: 1, flexDirection: 'row', gap: 2 },
  canvasPhone: { marginHorizontal: 0 },
});
