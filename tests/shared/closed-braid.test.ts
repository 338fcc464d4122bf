// Closed-braid pictures (shared/layout/closed-braid.ts): torus links and other braids drawn as
// strands on concentric circles, one crossing per letter, reading back as the braid's closure.
import { analyse } from '@/shared/drawing/analyse';
import { alexander } from '@/shared/knot/alexander';
import { fromBraid } from '@/shared/knot/braid';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { seededRng } from '@/shared/knot/moves/random';
import { torusLink } from '@/shared/knot/families';
import { closedBraidSketch } from '@/shared/layout';

const torusWord = (p: number, q: number) => Array.from({ length: q }, () => Array.from({ length: p - 1 }, (_, k) => k + 1)).flat();

/** Centre of the least-squares circle through the points (Kasa's fit: x^2 + y^2 + Dx + Ey + F = 0, linear in D, E, F). */
function fitCentre(points: { x: number; y: number }[]) {
  const rows = points.map((p) => [p.x, p.y, 1, -(p.x * p.x + p.y * p.y)]);
  const m = [0, 1, 2].map((i) => [0, 1, 2, 3].map((j) => rows.reduce((s, r) => s + r[i] * r[j], 0)));
  for (let i = 0; i < 3; i++) for (let k = 0; k < 3; k++) if (k !== i) {
    const f = m[k][i] / m[i][i];
    for (let j = 0; j < 4; j++) m[k][j] -= f * m[i][j];
  }
  return { x: -m[0][3] / m[0][0] / 2, y: -m[1][3] / m[1][1] / 2 };
}

function check(word: number[], strands: number) {
  const sketch = closedBraidSketch(word, strands);
  expect(sketch).not.toBeNull();
  const a = analyse(sketch!);
  const read = a.diagram!.diagram;
  const target = fromBraid(word, strands);
  // Invariants the picture's check does not look at: Alexander polynomial, determinant and
  // signature are invariants of the link (theorems), so the picture is of the closure.
  expect(JSON.stringify(alexander(read))).toBe(JSON.stringify(alexander(target)));
  expect(linkDeterminant(read)).toBe(linkDeterminant(target));
  expect(linkSignature(read)).toBe(linkSignature(target));
  // The standard picture: every strand stays within the annulus of the n circles round the centre.
  const all = a.paths.flatMap((p) => p.points);
  const centre = fitCentre(all);
  const r = all.map((p) => Math.hypot(p.x - centre.x, p.y - centre.y));
  expect(Math.max(...r) - Math.min(...r)).toBeLessThanOrEqual((strands - 1) * 40 + 2);
  return a;
}

test('torus links: p strands on p circles, q(p-1) crossings', () => {
  for (const [p, q] of [[2, 3], [2, 5], [3, 4], [3, 5], [4, 3], [2, 4], [5, 6]]) {
    const a = check(torusWord(p, q), p);
    expect(a.crossings).toHaveLength(q * (p - 1));
    // T(p, q) has gcd(p, q) components (common practice).
    const gcd = (x: number, y: number): number => (y ? gcd(y, x % y) : x);
    expect(a.diagram!.componentIds).toHaveLength(gcd(p, q));
    expect(JSON.stringify(alexander(a.diagram!.diagram))).toBe(JSON.stringify(alexander(torusLink(p, q))));
  }
});

test('mixed letters: the figure-eight [1,-2,1,-2] and seeded random braids on 3 and 4 strands', () => {
  check([1, -2, 1, -2], 3);
  const rnd = seededRng(7);
  for (let n = 0; n < 8; n++) {
    const strands = 3 + (n % 2);
    // Letters 1 and strands - 1 first, so that every strand is touched.
    const word = [1, strands - 1, ...Array.from({ length: 3 + Math.floor(rnd() * 8) }, () => 1 + Math.floor(rnd() * (strands - 1)))].map((k) => (rnd() < 0.5 ? -k : k));
    check(word, strands);
  }
});

test('a strand no letter touches: no braid picture (the general layout draws the split unknot)', () => {
  expect(closedBraidSketch([], 2)).toBeNull();
  expect(closedBraidSketch([1, -2, 1, -2], 4)).toBeNull();
});
