// Formatters and exports of Khovanov results (shared/khovanov/format.ts, export.ts), on the
// positive trefoil over Z: Z at (0,1), (0,3), (2,5), (3,9) and Z/2 at (3,7) (Bar-Natan 2002,
// arXiv math/0201043; docs/conventions.md, Khovanov homology).
import fc from 'fast-check';
import { StartRunRequest, type KhResultJson } from '@/shared/api/runs';
import { khovanov } from '@/shared/khovanov';
import { gradingConvention, readJsonExport, toCsv, toJson, toLatexTable, type ExportRecord } from '@/shared/khovanov/export';
import { grid, groupText, poincareFormat } from '@/shared/khovanov/format';
import { fromBraid } from '@/shared/knot/braid';
import { braidToText, pdToText } from '@/shared/text/codes';
import { programVersion } from '@/shared/version';
import { parseSource, sourceOf } from '@/lib/slate/codes';
import { arbBraid } from './arbitraries';
import pkg from '../../package.json';

const trefoilPD = fromBraid([1, 1, 1]).pd;
const trefoil = khovanov(trefoilPD, { ring: 'Z' });

/** A run's record as the run page builds it, for the braid word `word`. */
function record(word: number[], given?: KhResultJson): ExportRecord {
  const d = fromBraid(word);
  const result = given ?? khovanov(d.pd, { ring: 'Z', unknots: d.unknots });
  return { runId: 'run-1', label: `braid ${braidToText(word)}`, diagram: { pd: d.pd, unknots: d.unknots }, source: sourceOf('braid', braidToText(word)), date: '2026-12-02T10:00:00.000Z', result };
}

describe('groupText', () => {
  it('writes free parts as powers and groups equal torsion orders', () => {
    expect(groupText({ i: 0, j: 0, free: 2, torsion: [2] }, 'Z')).toBe('Z^2 + Z/2');
    expect(groupText({ i: 0, j: 0, free: 0, torsion: [2, 2, 4] }, 'Z')).toBe('(Z/2)^2 + Z/4');
    expect(groupText({ i: 0, j: 0, free: 1, torsion: [] }, 'F3')).toBe('F3');
    expect(groupText({ i: 0, j: 0, free: 0, torsion: [] }, 'Q')).toBe('0');
    expect(groupText({ i: 0, j: 0, free: 3, torsion: [3] }, 'Z', 'tex')).toBe('\\mathbb{Z}^{3} \\oplus \\mathbb{Z}/3');
    expect(groupText({ i: 0, j: 0, free: 2, torsion: [] }, 'F2', 'tex')).toBe('\\mathbb{F}_{2}^{2}');
  });
});

describe('grid', () => {
  it('spans every i and every second j, largest j on top, and finds each group', () => {
    const g = grid(trefoil.groups);
    expect(g.is).toEqual([0, 1, 2, 3]);
    expect(g.js).toEqual([9, 7, 5, 3, 1]);
    for (const x of trefoil.groups) expect(g.at(x.i, x.j)).toEqual(x);
    expect(g.at(1, 3)).toBeUndefined();
    expect(grid([])).toMatchObject({ is: [], js: [] });
  });
});

describe('Poincare polynomial', () => {
  it('uses h for the homological degree in every notation (docs/conventions.md)', () => {
    expect(poincareFormat(trefoil.poincare, 'text')).toBe('q + q^3 + h^2 q^5 + h^3 q^9');
    expect(poincareFormat(trefoil.poincare, 'tex')).toBe('q + q^{3} + h^{2}q^{5} + h^{3}q^{9}');
    expect(poincareFormat(trefoil.poincare, 'unicode')).toBe('q + q³ + h²q⁵ + h³q⁹');
    expect(poincareFormat([[0, 0, 2], [-1, -3, 2]], 'text')).toBe('2 + 2 h^-1 q^-3');
    expect(poincareFormat([[-1, -3, 2]], 'unicode')).toBe('2h⁻¹q⁻³');
    expect(poincareFormat([], 'tex')).toBe('0');
    expect(trefoil.poincareText).toBe(poincareFormat(trefoil.poincare, 'text'));
  });
});

describe('exports', () => {
  const r = record([1, 1, 1], trefoil);

  it('LaTeX: says it needs amssymb, carries the input, one row per j and one column per i', () => {
    const tex = toLatexTable(r);
    expect(tex).toContain('% Needs \\usepackage{amssymb}');
    expect(tex).toContain(`% PD code: ${pdToText(trefoilPD)}`);
    expect(tex).toContain('% Given as: braid 1 1 1');
    expect(tex).toContain(`% Grading: ${gradingConvention}`);
    expect(tex).toContain(`% Computed 2026-12-02T10:00:00.000Z by Overstrand ${programVersion}, run run-1`);
    expect(tex).toContain('over Z, unreduced');
    expect(tex).toContain('\\begin{tabular}{r|cccc}');
    expect(tex).toContain('$7$ &  &  &  & $\\mathbb{Z}/2$ \\\\');
    expect(tex).toContain('$1$ & $\\mathbb{Z}$ &  &  &  \\\\');
    expect(tex.trim().endsWith('\\end{tabular}')).toBe(true);
  });

  it('CSV: comment lines with the input, then ring and reduced columns and one line per group, read back to the groups', () => {
    const reduced = khovanov(trefoilPD, { ring: 'F3', reduced: true });
    const csv = toCsv(record([1, 1, 1], reduced));
    const lines = csv.trim().split('\n');
    const comments = lines.filter((l) => l.startsWith('#'));
    expect(comments.join('\n')).toContain(`PD code: ${pdToText(trefoilPD)}`);
    expect(comments[0]).toContain('over F3, reduced at component 1');
    const [header, ...rows] = lines.filter((l) => !l.startsWith('#'));
    expect(header).toBe('ring,reduced,reduced_at,i,j,free,torsion');
    const back = rows.map((row) => {
      const [ring, red, at, i, j, free, torsion] = row.split(',');
      expect([ring, red, at]).toEqual(['F3', 'true', '1']);
      return { i: +i, j: +j, free: +free, torsion: torsion ? torsion.split(';').map(Number) : [] };
    });
    expect(back).toEqual(reduced.groups);
    const zRows = toCsv(r).trim().split('\n').filter((l) => !l.startsWith('#')).slice(1);
    expect(zRows).toContain('Z,false,,3,7,0,2');
  });

  it('JSON: the input round-trips; starting a run from it and recomputing gives the exported groups', () => {
    fc.assert(
      fc.property(arbBraid(8, 4), (word) => {
        const e = record(word);
        const back = readJsonExport(toJson(e));
        expect(back).toMatchObject({ program: 'Overstrand', version: programVersion, runId: 'run-1', label: e.label, date: e.date, ring: 'Z', reduced: false, reducedAt: null, convention: gradingConvention });
        expect(back.input).toEqual({ pd: e.diagram.pd, unknots: e.diagram.unknots, source: e.source });
        expect(JSON.parse(pdToText(e.diagram.pd))).toEqual(e.diagram.pd);
        // The source is the input too: read again, it gives the same PD code.
        const again = parseSource(back.input.source!);
        expect(again.ok && again.diagram.pd).toEqual(back.input.pd);
        const req = StartRunRequest.parse({ diagram: { pd: back.input.pd, unknots: back.input.unknots }, source: back.input.source, label: back.label, ring: back.ring, reduced: back.reduced });
        expect(khovanov(req.diagram!.pd, { ring: req.ring as 'Z', unknots: req.diagram!.unknots }).groups).toEqual(back.result.groups);
      }),
      { numRuns: 25 },
    );
  });

  it('JSON: a reduced result says at which component', () => {
    const back = readJsonExport(toJson(record([1, 1, 1], khovanov(trefoilPD, { ring: 'Q', reduced: true }))));
    expect([back.reduced, back.reducedAt]).toEqual([true, 1]);
  });

  it('LaTeX, CSV and JSON carry s when the run computed it, and say nothing of s otherwise', () => {
    // docs/conventions.md (Rasmussen s-invariant): the positive trefoil has s = 2 over Q and F2.
    const withS = record([1, 1, 1], { ...trefoil, s: { Q: 2, F2: 2 } });
    const line = 'Rasmussen s: 2 over Q, 2 over F2 (signs: the positive trefoil has s = 2); slice genus >= |s|/2';
    expect(toLatexTable(withS)).toContain(`% ${line}`);
    expect(toCsv(withS)).toContain(`# ${line}`);
    expect(readJsonExport(toJson(withS)).result.s).toEqual({ Q: 2, F2: 2 });
    for (const text of [toLatexTable(r), toCsv(r), toJson(r)]) expect(text).not.toMatch(/Rasmussen|"s":/);
  });
});

describe('program version', () => {
  it('is the one package.json carries', () => {
    expect(programVersion).toBe(pkg.version);
  });
});
