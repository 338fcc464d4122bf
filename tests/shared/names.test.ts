// The name-that-knot table: every entry's code must reproduce the values listed beside it
// (from memory), and the matcher must recognise each entry, its mirror and other diagrams of it.
import { connectedSum, fromBraid, jones, Laurent, mirror, torusLink, unknot } from '@/shared/knot';
import { randomMoves } from '@/shared/knot/moves';
import { alexander } from '@/shared/knot/alexander';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { entryDiagram, guessName, knotTable, listedAlexander } from '@/shared/knot/names';
import { orient } from '@/shared/knot/pd';

describe('knot table', () => {
  it('has the 35 prime knots up to 8 crossings (Rolfsen, Appendix C: 1 + 1 + 2 + 3 + 7 + 21)', () => {
    expect(knotTable.map((k) => k.name)).toEqual([
      '3_1', '4_1', '5_1', '5_2', '6_1', '6_2', '6_3',
      ...Array.from({ length: 7 }, (_, i) => `7_${i + 1}`),
      ...Array.from({ length: 21 }, (_, i) => `8_${i + 1}`),
    ]);
    for (const k of knotTable) expect(k.source).toMatch(/from memory/);
  });

  it.each(knotTable.map((k) => [k.name, k] as const))('%s: the code reproduces the listed invariants', (name, k) => {
    const d = entryDiagram(k);
    expect(orient(d.pd).components.length + d.unknots).toBe(1);
    expect(d.pd.length).toBe(Number(name.split('_')[0])); // a minimal diagram
    expect(linkDeterminant(d)).toBe(BigInt(k.determinant));
    expect(Math.abs(linkSignature(d))).toBe(k.signature);
    expect(alexander(d).polynomial.equals(listedAlexander(k))).toBe(true);
    // Amphichiral knots have V(1/t) = V(t); every chiral knot up to 8 crossings is told apart
    // from its mirror by Jones (from memory: the first failure is 9_42).
    const v = jones(d);
    expect(v.substitute(-1).equals(v)).toBe(k.amphichiral);
    if (k.amphichiral) expect(k.signature).toBe(0);
  });

  it('separates every entry and every mirror by its Jones polynomial', () => {
    const seen = knotTable.flatMap((k) => {
      const v = jones(entryDiagram(k));
      return k.amphichiral ? [v] : [v, v.substitute(-1)];
    });
    const keys = new Set(seen.map((v) => v.format()));
    expect(keys.size).toBe(seen.length);
  });

  it('matches the published Jones polynomials of the representatives of 3_1 and 4_1', () => {
    // docs/conventions.md (positive trefoil t + t^3 - t^4); figure-eight from Jones 1985.
    expect(jones(entryDiagram(knotTable[0])).equals(Laurent.fromPairs([[1, 1], [3, 1], [4, -1]]))).toBe(true);
    expect(jones(entryDiagram(knotTable[1])).equals(Laurent.fromPairs([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]))).toBe(true);
  });
});

describe('guessName', () => {
  it.each(knotTable.map((k) => [k.name, k] as const))('recognises %s and its mirror', (name, k) => {
    const d = entryDiagram(k);
    expect(guessName(d)).toEqual({ name, mirror: false, text: `invariants match ${name}` });
    const m = guessName(mirror(d));
    expect(m?.name).toBe(name);
    expect(m?.mirror).toBe(!k.amphichiral);
    if (!k.amphichiral) expect(m?.text).toBe(`invariants match ${name} (mirror)`);
  });

  it('recognises other diagrams of the same knots', () => {
    // Closed braids (from memory): s1^3 is the positive trefoil, (s1 s2^-1)^2 the figure-eight,
    // T(3,4) = 8_19, (s1 s2^-1)^4 = 8_18.
    const trefoil = guessName(fromBraid([1, 1, 1]));
    const tableTrefoil = jones(entryDiagram(knotTable[0])).equals(jones(fromBraid([1, 1, 1])));
    expect(trefoil).toEqual({ name: '3_1', mirror: !tableTrefoil, text: tableTrefoil ? 'invariants match 3_1' : 'invariants match 3_1 (mirror)' });
    expect(guessName(fromBraid([1, -2, 1, -2]))?.name).toBe('4_1');
    expect(guessName(torusLink(3, 4))?.name).toBe('8_19');
    expect(guessName(fromBraid([1, -2, 1, -2, 1, -2, 1, -2]))?.name).toBe('8_18');
    expect(guessName(fromBraid([1, -1, 1]))?.name).toBe('0_1'); // a diagram of the unknot
    expect(guessName(unknot)?.name).toBe('0_1');
  });

  it('recognises every entry after random Reidemeister moves', () => {
    knotTable.forEach((k, seed) => {
      expect(guessName(randomMoves(entryDiagram(k), 6, seed))?.text).toBe(`invariants match ${k.name}`);
    });
  });

  it('does not mistake composite knots for prime ones', () => {
    // The square knot 3_1 # 3_1* shares its Alexander polynomial (t^2 - t + 1)^2 with 8_20
    // (from memory); its Jones polynomial V(3_1) V(3_1*) tells them apart.
    const trefoil = fromBraid([1, 1, 1]);
    expect(alexander(connectedSum(trefoil, mirror(trefoil))).polynomial.equals(listedAlexander(knotTable.find((k) => k.name === '8_20')!))).toBe(true);
    expect(guessName(connectedSum(trefoil, mirror(trefoil)))).toBeUndefined();
    expect(guessName(connectedSum(trefoil, trefoil))).toBeUndefined(); // granny knot
    expect(guessName(connectedSum(trefoil, fromBraid([1, -2, 1, -2])))).toBeUndefined(); // 3_1 # 4_1
  });

  it('stays silent for links and for knots beyond the table', () => {
    expect(guessName(fromBraid([1, 1]))).toBeUndefined(); // Hopf link
    expect(guessName(torusLink(2, 9))).toBeUndefined(); // 9_1
    expect(guessName(torusLink(3, 5))).toBeUndefined(); // 10_124
  });
});
