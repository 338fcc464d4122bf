// The three export files of a drawing: SVG (chalk on slate, each component its colour), TikZ
// (black on paper, for papers) and the SVG a PNG is rasterised from; bands as ribbons in both.
import type { Analysis } from '@/shared/drawing/analyse';
import { bandsOf } from '@/shared/drawing/bands';
import { toSVG, toTikZ } from '@/shared/drawing/export';
import { slate } from '@/constants/theme';
import { colourOf } from './picture';
import type { SlateDoc } from './record';

const slug = (title: string) => title.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'sketch';

export function exportFiles(doc: SlateDoc, a: Analysis, title: string) {
  const colors = a.paths.map((p) => colourOf(doc, p.id));
  const base = slug(title);
  const bands = bandsOf(doc.sketch).map((b) => b.core);
  return {
    svg: { name: `${base}.svg`, mime: 'image/svg+xml', text: toSVG(a, { colors, background: slate.surface, strokeWidth: 3.4, padding: 24, bands, bandColor: slate.band }) },
    tikz: { name: `${base}.tex`, mime: 'text/x-tex', text: toTikZ(a, { bands }) },
    pngName: `${base}.png`,
  };
}
