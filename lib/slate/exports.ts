// The three export files of a drawing: SVG (chalk on slate, each component its colour), TikZ
// (black on paper, for papers; a bare picture or a standalone document) and the SVG a PNG is
// rasterised from; bands as ribbons in both. Options add each component's orientation arrow,
// its number (as on the Slate) and its framing (blackboard framings resolved to their integer,
// as the Readout gives).
import type { Analysis } from '@/shared/drawing/analyse';
import { bandsOf } from '@/shared/drawing/bands';
import { toSVG, toTikZ, type ComponentLabel, type Marks } from '@/shared/drawing/export';
import { framingsOf } from '@/shared/knot/diagram';
import { slate } from '@/constants/theme';
import { colourOf, drawingNumbers } from './picture';
import type { SlateDoc } from './record';

export interface ExportChoices {
  arrows: boolean;
  numbers: boolean;
  framings: boolean;
  /** TikZ as a LaTeX document of its own instead of a tikzpicture to paste. */
  standalone: boolean;
}

export const defaultExportChoices: ExportChoices = { arrows: false, numbers: false, framings: false, standalone: false };

const slug = (title: string) => title.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'sketch';

function marksOf(doc: SlateDoc, a: Analysis, choices: ExportChoices): Marks {
  const numbers = drawingNumbers(doc);
  const d = a.diagram;
  const framings = d && choices.framings ? framingsOf(d.diagram) : [];
  const labels = a.paths.map((p): ComponentLabel | null => {
    const k = d ? d.componentIds.indexOf(p.id) : -1;
    const label = {
      ...(choices.numbers && numbers.has(p.id) ? { number: numbers.get(p.id) } : {}),
      ...(k >= 0 && choices.framings ? { framing: framings[k] } : {}),
    };
    return Object.keys(label).length ? label : null;
  });
  return { arrows: choices.arrows, labels };
}

export function exportFiles(doc: SlateDoc, a: Analysis, title: string, choices: ExportChoices = defaultExportChoices) {
  const colors = a.paths.map((p) => colourOf(doc, p.id));
  const marks = marksOf(doc, a, choices);
  const base = slug(title);
  const bands = bandsOf(doc.sketch).map((b) => b.core);
  return {
    svg: { name: `${base}.svg`, mime: 'image/svg+xml', text: toSVG(a, { colors, background: slate.surface, strokeWidth: 3.4, padding: 24, bands, bandColor: slate.band, marks }) },
    tikz: { name: `${base}.tex`, mime: 'text/x-tex', text: toTikZ(a, { bands, marks, standalone: choices.standalone }) },
    pngName: `${base}.png`,
  };
}
