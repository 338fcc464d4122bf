// The chain maps of R1 and R2 moves (shared/knot/bands/reidemeister-maps.ts). What they must do:
// commute with the differential in bidegree (0, 0) and be homotopy inverse to each other
// (Bar-Natan, "Khovanov's homology for tangles and cobordisms", 2005, arXiv math/0410495,
// section 4.3; Khovanov, "An invariant of tangle cobordisms", 2006, arXiv math/0207264); a
// movie of Reidemeister moves returning to its start induces +-1 on Kh over Z (Jacobsson, "An
// invariant of link cobordisms from Khovanov homology", 2004, arXiv math/0206303; Bar-Natan
// 2005), so 1 over F2.
import { reidemeisterMaps, ReidemeisterMaps } from '@/shared/knot/bands/reidemeister-maps';
import { fromBraid } from '@/shared/knot/braid';
import { Diagram } from '@/shared/knot/diagram';
import { rationalLink } from '@/shared/knot/families';
import { addBigon, addKink, bigons, faces, pushAcross, removeBigon, removeKink, Rng, seededRng } from '@/shared/knot/moves';
import { renaming } from '@/shared/knot/bands/renaming';
import { chainMapFailures, Complex, compose, cubeComplex, GeneratorMap, homotopyFailures, identityOnF2, identityOnZ } from './kh-cube';

// Total ranks of Kh over F2: for these thin links Kh(F2) is the reduced homology tensor
// F2[x]/(x^2) (Shumakovitch, "Torsion of the Khovanov homology", 2004, arXiv math/0405474),
// and the reduced homology of an alternating link has rank det (Manolescu and Ozsvath, "On the
// Khovanov and knot Floer homologies of quasi-alternating links", 2007, arXiv 0708.3249):
// 2 det = 6, 10, 4 (det 3, 5, 2: Rolfsen, Knots and Links, Appendix C).
const fixtures: { name: string; d: Diagram; f2Rank: number }[] = [
  { name: 'trefoil', d: fromBraid([1, 1, 1], 2), f2Rank: 6 },
  { name: 'figure-eight', d: rationalLink([2, 2]), f2Rank: 10 },
  { name: 'Hopf link', d: fromBraid([1, 1], 2), f2Rank: 4 },
];

const kinkTypes = [
  { sign: 1, overFirst: true },
  { sign: 1, overFirst: false },
  { sign: -1, overFirst: true },
  { sign: -1, overFirst: false },
] as const;

const pick = <T>(rng: Rng, list: readonly T[]): T => list[Math.floor(rng() * list.length)];
const labelOf = (d: Diagram, rng: Rng): number => pick(rng, d.pd.flat());

/** A finger of one edge across another of the same face (moves/random.ts draws the same way). */
function randomFinger(d: Diagram, rng: Rng): Diagram {
  const face = pick(rng, faces(d.pd).filter((f) => new Set(f.map((c) => d.pd[c.crossing][c.arrive])).size > 1));
  const label = (k: number): number => d.pd[face[k].crossing][face[k].arrive];
  const i = Math.floor(rng() * face.length);
  const js = face.map((_, j) => j).filter((j) => label(j) !== label(i));
  return pushAcross(d, face, i, pick(rng, js), rng() < 0.5);
}

interface Move {
  small: Diagram;
  big: Diagram;
  maps: ReidemeisterMaps;
}
const move = (small: Diagram, big: Diagram, moved: number[]): Move => ({ small, big, maps: reidemeisterMaps(small.pd, big.pd, moved) });
const kink = (d: Diagram, label: number, k: number): Move => move(d, addKink(d, label, kinkTypes[k]), [d.pd.length]);
const finger = (d: Diagram, big: Diagram): Move => move(d, big, [d.pd.length, d.pd.length + 1]);

const complexes = new Map<Diagram, Complex>();
const cx = (d: Diagram): Complex => complexes.get(d) ?? complexes.set(d, cubeComplex(d.pd)).get(d)!;

describe('the maps are chain maps of bidegree (0, 0), down after up the identity on chains, up after down 1 + dh + hd', () => {
  const rng = seededRng(18);
  const cases: [string, Move][] = fixtures.flatMap(({ name, d }) => [
    ...kinkTypes.map((t, k): [string, Move] => [`${name}, kink ${t.sign > 0 ? '+' : '-'}${t.overFirst ? ' over first' : ' under first'}`, kink(d, labelOf(d, rng), k)]),
    ...[0, 1, 2].map((k): [string, Move] => [`${name}, finger ${k + 1}`, finger(d, randomFinger(d, rng))]),
  ]);
  it.each(cases)('%s', (_, m) => {
    const [small, big] = [cx(m.small), cx(m.big)];
    expect(chainMapFailures(m.maps.up, small, big)).toEqual([]);
    expect(chainMapFailures(m.maps.down, big, small)).toEqual([]);
    const roundTrip = compose([m.maps.up, m.maps.down], [small, big, small]);
    small.gens.forEach((_, i) => expect([...roundTrip(new Map([[i, 1]]))]).toEqual([[i, 1]]));
    if (m.maps.homotopy) expect(homotopyFailures(compose([m.maps.down, m.maps.up], [big, small, big]), m.maps.homotopy, big)).toEqual([]);
  });
});

describe('up after down is the identity on Kh(D\') over Z and over F2', () => {
  const rng = seededRng(46);
  it.each(fixtures)('$name: R1 of both signs and R2, on a link with nontrivial Kh', ({ d, f2Rank }) => {
    expect(identityOnF2(cx(d), (v) => v).rank).toBe(f2Rank);
    for (const m of [kink(d, labelOf(d, rng), 0), kink(d, labelOf(d, rng), 2), finger(d, randomFinger(d, rng))]) {
      const big = cx(m.big);
      const back = compose([m.maps.down, m.maps.up], [big, cx(m.small), big]);
      const z = identityOnZ(big, back);
      expect(z.nontrivial).toBeGreaterThan(0);
      expect(z.signs).toContain(1);
      expect(identityOnF2(big, back)).toEqual({ identity: true, rank: f2Rank });
    }
  }, 60_000);
});

/** A loop of moves D_0 -> ... -> D_0 (the last step a renaming), checked for +-1 over Z and 1 over F2. */
function expectIdentity(start: Diagram, steps: { map: GeneratorMap; to: Diagram }[], anchor: [number, number] = [0, 0]): void {
  const chain = [start, ...steps.map((s) => s.to)];
  const end = chain[chain.length - 1];
  const loop = compose([...steps.map((s) => s.map), renaming(end.pd, start.pd, anchor)], [...chain.map(cx), cx(start)]);
  const z = identityOnZ(cx(start), loop);
  expect(z.nontrivial).toBeGreaterThan(0);
  expect(z.signs.length).toBeGreaterThan(0);
  expect(identityOnF2(cx(start), loop).identity).toBe(true);
}

describe('movies of Reidemeister moves that return to the start induce +-1 (random positions)', () => {
  const seeds = [1, 2, 3];
  it.each(fixtures.flatMap(({ name, d }) => seeds.map((seed) => [name, seed, d] as const)))('%s, seed %d: R2 made, R1 made elsewhere, R2 undone, R1 undone', (_, seed, d0) => {
    const rng = seededRng(seed);
    const n = d0.pd.length;
    const d1 = randomFinger(d0, rng);
    // Elsewhere: not on an edge of the bigon, which would then hold the kink.
    const d2 = addKink(d1, pick(rng, d1.pd.flat().filter((l) => !d1.pd[n].includes(l) || !d1.pd[n + 1].includes(l))), pick(rng, kinkTypes));
    const bigon = bigons(d2).find((b) => Math.min(...b.crossings) === n && Math.max(...b.crossings) === n + 1)!;
    const d3 = removeBigon(d2, bigon);
    const d4 = removeKink(d3, n);
    expectIdentity(d0, [
      { map: reidemeisterMaps(d0.pd, d1.pd, [n, n + 1]).up, to: d1 },
      { map: reidemeisterMaps(d1.pd, d2.pd, [n + 2]).up, to: d2 },
      { map: reidemeisterMaps(d3.pd, d2.pd, [n, n + 1]).down, to: d3 },
      { map: reidemeisterMaps(d4.pd, d3.pd, [n]).down, to: d4 },
    ]);
  }, 60_000);

  it.each(fixtures.flatMap(({ name, d }) => seeds.map((seed) => [name, seed, d] as const)))('%s, seed %d: two kinks made, undone first-made first', (_, seed, d0) => {
    const rng = seededRng(100 + seed);
    const n = d0.pd.length;
    const d1 = addKink(d0, labelOf(d0, rng), pick(rng, kinkTypes));
    // Not on the first kink's loop, which would then be no kink.
    const d2 = addKink(d1, pick(rng, d1.pd.flat().filter((l) => d1.pd[n].filter((m) => m === l).length < 2)), pick(rng, kinkTypes));
    const d3 = removeKink(d2, n);
    const d4 = removeKink(d3, n);
    expectIdentity(d0, [
      { map: reidemeisterMaps(d0.pd, d1.pd, [n]).up, to: d1 },
      { map: reidemeisterMaps(d1.pd, d2.pd, [n + 1]).up, to: d2 },
      { map: reidemeisterMaps(d3.pd, d2.pd, [n]).down, to: d3 },
      { map: reidemeisterMaps(d4.pd, d3.pd, [n]).down, to: d4 },
    ]);
  }, 60_000);

  // A finger of E across F at a corner of their crossing A, E over at A as at the finger: the
  // bigon between A and the nearer new crossing is removed instead, and the diagram is the
  // start again with the far new crossing in A's place.
  it.each(fixtures)('$name: R2 made at a corner, undone with the other pair', ({ d: d0 }) => {
    const n = d0.pd.length;
    let loops = 0;
    for (let crossing = 0; crossing < n; crossing++) {
      for (let position = 0; position < 4; position++) {
        for (const eOver of [true, false]) {
          const d1 = addBigon(d0, crossing, position, eOver);
          const other = bigons(d1).find((b) => b.crossings.some((c) => c < n) && b.crossings.some((c) => c >= n));
          if (!other) continue;
          const d2 = removeBigon(d1, other);
          // An old crossing other than A keeps its place, less one when it came after A.
          const a = Math.min(...other.crossings);
          const kept = a === 0 ? 1 : 0;
          expectIdentity(
            d0,
            [
              { map: reidemeisterMaps(d0.pd, d1.pd, [n, n + 1]).up, to: d1 },
              { map: reidemeisterMaps(d2.pd, d1.pd, [...other.crossings].sort((p, q) => p - q)).down, to: d2 },
            ],
            [kept - (kept > a ? 1 : 0), kept],
          );
          loops++;
        }
      }
    }
    expect(loops).toBeGreaterThan(0);
  }, 120_000);
});

describe('the chain-map check can fail', () => {
  const dropNegative = (f: GeneratorMap): GeneratorMap => (g) => f(g).filter(([, c]) => c > 0);
  const firstOnly = (f: GeneratorMap): GeneratorMap => (g) => f(g).slice(0, 1);
  const flipLater = (f: GeneratorMap): GeneratorMap => (g) => f(g).map(([h, c], k) => [h, k === 0 ? c : -c] as const);
  const d = fixtures[0].d;
  it.each([
    ['a positive kink without its -(X_e v).1 term', kink(d, 1, 0), dropNegative],
    ['a finger without its correction on the resolution with O', finger(d, randomFinger(d, seededRng(7))), firstOnly],
    ['a finger with the correction of the wrong sign', finger(d, randomFinger(d, seededRng(7))), flipLater],
  ] as const)('%s', (_, m, spoil) => {
    expect(chainMapFailures(spoil(m.maps.up), cx(m.small), cx(m.big)).length).toBeGreaterThan(0);
  });
});
