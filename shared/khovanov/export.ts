// Exports of a Khovanov result for papers and scripts: a LaTeX tabular (i across, j down), CSV
// (one row per nonzero group) and JSON. Each carries what a reader needs to cite it: the full
// input (PD code and the text it came from), the label, the ring, reduced or not (and at which
// component), the grading convention, the date, the program version and the run id, and s when
// the run computed it (in the header lines; the JSON's result holds it too). The JSON
// reads back (readJsonExport), so a result can be started again from its export.

import { z } from 'zod';
import { KhResultJson, RunDiagram, RunSource } from '../api/runs';
import type { PDCode } from '../knot/pd';
import { pdToText } from '../text/codes';
import { grid, groupText, poincareFormat } from './format';

/** The grading in one line, as docs/conventions.md (Khovanov homology) fixes it. */
export const gradingConvention =
  'Bar-Natan 2002 (arXiv math/0201043): cohomological, (i, j) = (homological, quantum); Poincare polynomial sum rank h^i q^j; Euler characteristic (q + q^-1) V(L) at t^(1/2) = -q (V(L) when reduced)';

export interface ExportRecord {
  /** The run's id; null for a result computed on this device. */
  readonly runId: string | null;
  readonly label: string;
  readonly diagram: { readonly pd: PDCode; readonly unknots: number };
  /** The text the PD code came from ("braid 1 1 1"), or null. */
  readonly source: string | null;
  /** When it was computed, ISO 8601. */
  readonly date: string;
  readonly result: KhResultJson;
}

/** Reduced: the marked component numbered from 1, as the Slate labels components; else null. */
const reducedAt = (r: KhResultJson): number | null => (r.reduced ? (r.component ?? 0) + 1 : null);

const oneLine = (s: string) => s.replace(/\s+/g, ' ').trim();

/** What the record says, line by line, for the comment header of the LaTeX and CSV files. */
function header(e: ExportRecord): string[] {
  const r = e.result;
  const at = reducedAt(r);
  return [
    `Khovanov homology of ${oneLine(e.label)} over ${r.ring}${at ? `, reduced at component ${at}` : ', unreduced'}`,
    `PD code: ${pdToText(e.diagram.pd)}${e.diagram.unknots ? ` and ${e.diagram.unknots} crossingless unknot${e.diagram.unknots === 1 ? '' : 's'}` : ''}`,
    ...(e.source ? [`Given as: ${oneLine(e.source)}`] : []),
    `Grading: ${gradingConvention}`,
    `Poincare polynomial: ${poincareFormat(r.poincare, 'text')}`,
    // docs/conventions.md (Rasmussen s-invariant) fixes the sign.
    ...(r.s ? [`Rasmussen s: ${r.s.Q} over Q, ${r.s.F2} over F2 (signs: the positive trefoil has s = 2); slice genus >= |s|/2`] : []),
    `Computed ${e.date} by Overstrand ${r.version ?? '(version not recorded)'}${e.runId ? `, run ${e.runId}` : ', on a device'}`,
  ];
}

/** A tabular of the nonzero groups; empty cells stay empty. The header says it needs amssymb. */
export function toLatexTable(e: ExportRecord): string {
  const r = e.result;
  const g = grid(r.groups);
  const head = ['j \\backslash i', ...g.is.map(String)].map((c) => `$${c}$`).join(' & ');
  const rows = g.js.map((j) => {
    const cells = g.is.map((i) => {
      const x = g.at(i, j);
      return x ? `$${groupText(x, r.ring, 'tex')}$` : '';
    });
    return [`$${j}$`, ...cells].join(' & ') + ' \\\\';
  });
  return [
    ...header(e).map((l) => `% ${l}`),
    '% Needs \\usepackage{amssymb} (for \\mathbb).',
    `\\begin{tabular}{r|${'c'.repeat(g.is.length)}}`,
    `${head} \\\\`,
    '\\hline',
    ...rows,
    '\\end{tabular}',
    '',
  ].join('\n');
}

/** '#' comment lines (the record), then ring,reduced,reduced_at,i,j,free,torsion; torsion orders joined by ';'. */
export function toCsv(e: ExportRecord): string {
  const r = e.result;
  const lead = `${r.ring},${r.reduced},${reducedAt(r) ?? ''}`;
  const lines = r.groups.map((g) => `${lead},${g.i},${g.j},${g.free},${g.torsion.join(';')}`);
  return [...header(e).map((l) => `# ${l}`), 'ring,reduced,reduced_at,i,j,free,torsion', ...lines, ''].join('\n');
}

/** The JSON export: the record's facts at the top level, the input under `input`, then the result. */
export const KhExportJson = z.object({
  program: z.literal('Overstrand'),
  version: z.string().nullable(),
  runId: z.string().nullable(),
  label: z.string(),
  date: z.string(),
  input: z.object({ pd: RunDiagram.shape.pd, unknots: z.int().min(0), source: RunSource.nullable() }),
  ring: z.string(),
  reduced: z.boolean(),
  reducedAt: z.int().min(1).nullable(),
  convention: z.string(),
  result: KhResultJson,
});
export type KhExportJson = z.infer<typeof KhExportJson>;

export function toJson(e: ExportRecord): string {
  const out: KhExportJson = {
    program: 'Overstrand',
    version: e.result.version ?? null,
    runId: e.runId,
    label: e.label,
    date: e.date,
    input: { pd: e.diagram.pd.map((x) => [...x] as [number, number, number, number]), unknots: e.diagram.unknots, source: e.source },
    ring: e.result.ring,
    reduced: e.result.reduced,
    reducedAt: reducedAt(e.result),
    convention: gradingConvention,
    result: e.result,
  };
  return JSON.stringify(out, null, 2) + '\n';
}

/** A JSON export read back (ZodError when it is not one). */
export const readJsonExport = (text: string): KhExportJson => KhExportJson.parse(JSON.parse(text));
