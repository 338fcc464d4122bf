// What the Readout's buttons do on the Slate (alternate, simplify, copy, export, run, draw a
// pasted or built diagram), and the short message each leaves under them for 4 s.
import { useEffect, useState } from 'react';
import { router } from 'expo-router';
import * as Clipboard from 'expo-clipboard';
import { alternate } from '@/shared/drawing/alternate';
import type { Analysis } from '@/shared/drawing/analyse';
import type { Sketch } from '@/shared/drawing/sketch';
import { simplify } from '@/shared/knot/moves/simplify';
import type { Diagram } from '@/shared/knot/diagram';
import { pdToText } from '@/shared/text/codes';
import { exportFiles, type ExportChoices } from '@/lib/slate/exports';
import { savePng } from '@/lib/slate/png';
import { docFromDiagram, type SlateDoc } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';
import type { LocalSketch } from '@/lib/store/types';
import { saveText } from '@/components/ui/save';
import type { ExportKind } from '@/components/readout/ReadoutActions';

/** `onDrawn` runs after a diagram is drawn (the dialog that gave it closes). */
export function useSlateActions(sketch: LocalSketch, doc: SlateDoc, analysis: Analysis, onDrawn: () => void) {
  const diagram = analysis.diagram?.diagram ?? null;
  const [message, setMessage] = useState<string | null>(null);
  useEffect(() => {
    if (!message) return;
    const t = setTimeout(() => setMessage(null), 4000);
    return () => clearTimeout(t);
  }, [message]);

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
    onDrawn();
  };
  const simplifyNow = () => {
    if (!diagram) return;
    const s = simplify(diagram);
    if (s.pd.length === diagram.pd.length) return setMessage('Nothing to simplify: no R1 kink or R2 bigon.');
    draw(s);
    setMessage(`Simplified from ${diagram.pd.length} to ${s.pd.length} crossings.`);
  };
  // A browser may refuse the clipboard (no permission, or a page not served over https).
  const copy = async (text: string, what: string) => {
    const copied = await Clipboard.setStringAsync(text).catch(() => false);
    setMessage(copied ? `Copied the ${what}.` : `Could not copy the ${what}: this browser refused the clipboard.`);
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
  return { message, alternateNow, draw, simplifyNow, copy, exportAs, startRun };
}
