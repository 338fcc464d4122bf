// Exports of a Khovanov result for papers and scripts: a LaTeX tabular (i across, j down),
// CSV (one row per nonzero group) and JSON (the stored result, pretty-printed).

import { grid, groupText, type GroupLike } from './format';

export interface ExportableResult {
  readonly ring: string;
  readonly reduced: boolean;
  readonly groups: readonly GroupLike[];
}

/** A tabular of the nonzero groups; empty cells stay empty. Needs amssymb for \mathbb. */
export function toLatexTable(r: ExportableResult): string {
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
    `% Khovanov homology over ${r.ring}${r.reduced ? ', reduced' : ''} (Bar-Natan 2002 grading)`,
    `\\begin{tabular}{r|${'c'.repeat(g.is.length)}}`,
    `${head} \\\\`,
    '\\hline',
    ...rows,
    '\\end{tabular}',
    '',
  ].join('\n');
}

/** Header i,j,free,torsion; torsion orders joined by ';' (empty when there is none). */
export function toCsv(r: ExportableResult): string {
  const lines = r.groups.map((g) => `${g.i},${g.j},${g.free},${g.torsion.join(';')}`);
  return ['i,j,free,torsion', ...lines, ''].join('\n');
}

export function toJson(r: ExportableResult): string {
  return JSON.stringify(r, null, 2) + '\n';
}
