// Formatters of Khovanov results (shared/khovanov/format.ts, export.ts), on the positive
// trefoil over Z: Z at (0,1), (0,3), (2,5), (3,9) and Z/2 at (3,7) (Bar-Natan 2002, math/0201043).
import { khovanov } from '@/shared/khovanov';
import { toCsv, toJson, toLatexTable } from '@/shared/khovanov/export';
import { grid, groupText, poincareTeX } from '@/shared/khovanov/format';
import { fromBraid } from '@/shared/knot/braid';

const trefoil = khovanov(fromBraid([1, 1, 1]).pd, { ring: 'Z' });

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

describe('exports', () => {
  it('LaTeX: one row per j, one column per i, the torsion in place', () => {
    const tex = toLatexTable(trefoil);
    expect(tex).toContain('\\begin{tabular}{r|cccc}');
    expect(tex).toContain('$7$ &  &  &  & $\\mathbb{Z}/2$ \\\\');
    expect(tex).toContain('$1$ & $\\mathbb{Z}$ &  &  &  \\\\');
    expect(tex.trim().endsWith('\\end{tabular}')).toBe(true);
  });

  it('CSV: a header and one line per nonzero group, read back to the same groups', () => {
    const csv = toCsv(trefoil);
    const [header, ...rows] = csv.trim().split('\n');
    expect(header).toBe('i,j,free,torsion');
    const back = rows.map((r) => {
      const [i, j, free, torsion] = r.split(',');
      return { i: +i, j: +j, free: +free, torsion: torsion ? torsion.split(';').map(Number) : [] };
    });
    expect(back).toEqual(trefoil.groups);
  });

  it('JSON: parses back to the result', () => {
    expect(JSON.parse(toJson(trefoil))).toEqual(JSON.parse(JSON.stringify(trefoil)));
  });

  it('Poincare polynomial as TeX', () => {
    expect(poincareTeX(trefoil.poincare)).toBe('q + q^{3} + t^{2}q^{5} + t^{3}q^{9}');
    expect(poincareTeX([[0, 0, 2]])).toBe('2');
  });
});
