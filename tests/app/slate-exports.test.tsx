// The Slate's export files with their options: labels say each component's number as the Slate
// numbers it and its framing as the Readout resolves it; TikZ bare or as a LaTeX document.
import { analyse } from '@/shared/drawing/analyse';
import { fromBraid } from '@/shared/knot/braid';
import { defaultExportChoices, exportFiles } from '@/lib/slate/exports';
import { drawingNumbers, fitView, strandPictures } from '@/lib/slate/picture';
import { docFromDiagram } from '@/lib/slate/record';

const labelsOf = (svg: string) => [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
const all = { arrows: true, numbers: true, framings: true, standalone: true };

test('a framed Hopf link: each label pairs the Slate number with that component framing', () => {
  // The closure of sigma1^2 is the Hopf link (docs/conventions.md, Braid word), given framings 1 and -2.
  const doc = docFromDiagram({ ...fromBraid([1, 1]), framings: [1, -2] });
  const a = analyse(doc.sketch);
  const files = exportFiles(doc, a, 'Hopf, framed', all);
  const numbers = drawingNumbers(doc);
  const [first, second] = a.diagram!.componentIds.map((id) => numbers.get(id));
  expect(labelsOf(files.svg.text).sort()).toEqual([`${first}: +1`, `${second}: \u22122`].sort());
  expect(files.svg.text.match(/ Z" fill=/g)).toHaveLength(2);
  expect(files.tikz.name).toBe('hopf-framed.tex');
  expect(files.tikz.text).toContain(`{$${second}\\colon -2$};`);
  expect(files.tikz.text.split('\n')[0]).toBe('\\documentclass[border=2mm]{standalone}');
});

test('the canvas badges write those framings as the SVG labels do, with a minus sign', () => {
  // The Hopf link as above (docs/conventions.md, Braid word), framings 1 and -2.
  const doc = docFromDiagram({ ...fromBraid([1, 1]), framings: [1, -2] });
  const pictures = strandPictures(doc, analyse(doc.sketch), fitView(doc.sketch.components.flatMap((c) => c.points), 400, 400));
  expect(pictures.map((p) => p.badge?.text).sort()).toEqual(['+1', '\u22122']);
});

test('a blackboard framing is written as its integer, the writhe', () => {
  // The closure of [1,1,1] is the positive trefoil: three positive crossings, so its blackboard
  // framing (the writhe of its self-crossings, docs/conventions.md, Framings) is +3.
  const doc = docFromDiagram(fromBraid([1, 1, 1]));
  const files = exportFiles(doc, analyse(doc.sketch), '', { ...defaultExportChoices, framings: true });
  expect(labelsOf(files.svg.text)).toEqual(['+3']);
  expect(files.svg.name).toBe('sketch.svg');
});

test('without options the files carry the strands only', () => {
  const doc = docFromDiagram(fromBraid([1, 1]));
  const files = exportFiles(doc, analyse(doc.sketch), 'x');
  expect(files.svg.text).not.toMatch(/<text| Z" fill=/);
  expect(files.tikz.text).not.toMatch(/\\node|\\fill|documentclass/);
});
