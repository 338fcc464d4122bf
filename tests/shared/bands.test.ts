// Band presentations: the saddle moves, the after-bands diagram and its certificates. Sources
// beside each value; the presentations are built in bands-fixtures.ts.
import { afterBands, BandError, bandCertificate, BandPresentation, surfaceClass } from '@/shared/knot/bands';
import { fromBraid } from '@/shared/knot/braid';
import { evaluateClosed, Frame } from '@/shared/knot/bands/movie';
import { alexander } from '@/shared/knot/alexander';
import { diagram } from '@/shared/knot/diagram';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { jones } from '@/shared/knot/jones';
import { disjointUnion, mirror } from '@/shared/knot/families';
import { seededRng } from '@/shared/knot/moves';
import { guessName } from '@/shared/knot/names';
import { Laurent } from '@/shared/poly/laurent';
import { rasmussenS, sliceGenusBounds } from '@/shared/rasmussen';
import { p33m2, p33m3, ribbon, squareKnot, stevedore, trefoil } from './bands-fixtures';
import { scramble } from './scramble';

const on = (pd: BandPresentation['pd'], ...saddles: [number, number][]): BandPresentation => ({ pd, unknots: 0, saddles: saddles.map(([a, b]) => ({ a, b })) });

describe('closed surfaces from movies of circles', () => {
  // Rasmussen, "Khovanov's invariant for closed surfaces", 2005, arXiv math/0502527: the
  // Khovanov-Jacobsson number of a closed orientable surface is 2 for a torus and 0 otherwise.
  const b: Frame = { birth: true };
  it('a sphere (birth, death) is 0', () => {
    expect(evaluateClosed([b, { death: 0 }])).toBe(0);
  });
  it('a torus (birth, split, merge, death) is 2', () => {
    expect(evaluateClosed([b, { split: 0 }, { merge: [0, 1] }, { death: 0 }])).toBe(2);
  });
  it('a genus-2 surface is 0; a sphere drawn with two circles (birth, birth, merge, death) is 0', () => {
    expect(evaluateClosed([b, { split: 0 }, { merge: [0, 1] }, { split: 0 }, { merge: [1, 0] }, { death: 0 }])).toBe(0);
    expect(evaluateClosed([b, b, { merge: [1, 0] }, { death: 0 }])).toBe(0);
  });
  it('a movie that does not end empty is refused', () => {
    expect(() => evaluateClosed([b])).toThrow(/ends with 1 circles/);
  });
});

describe('saddles on a PD code', () => {
  it('refuses a non-orientable band, edges without a common face, a missing edge, an edge joined to itself', () => {
    // Trefoil [[4,2,5,1],[2,6,3,5],[6,4,1,3]]: edges 2 and 5 bound a face but run opposite ways around it.
    expect(() => afterBands(on(trefoil.pd, [2, 5]))).toThrow(new BandError('band 1 would make the surface non-orientable: edges 2 and 5 run opposite ways around their common face'));
    expect(() => afterBands(on(trefoil.pd, [4, 5]))).toThrow(new BandError('band 1: edges 4 and 5 do not border a common face'));
    expect(() => afterBands(on(trefoil.pd, [4, 9]))).toThrow(/there is no edge 9/);
    expect(() => afterBands(on(trefoil.pd, [4, 4]))).toThrow(/joins edge 4 to itself/);
    // The second band is checked on the diagram after the first.
    expect(() => afterBands(on(trefoil.pd, [4, 6], [1, 4]))).toThrow(/band 2 would make the surface non-orientable/);
  });

  it('a band at a crossing smooths it: the trefoil becomes the Hopf link, which is not certified although Kh has rank 4 = 2^2', () => {
    // Kh(Hopf) has rank 4 in degrees h = 0 and 2 (Khovanov 2000, arXiv math/9908171), so only the
    // bigraded group tells it from the 2-component unlink (Batson and Seed 2015, arXiv 1303.6240).
    const c = bandCertificate(on(trefoil.pd, [4, 6]));
    expect(c).toMatchObject({ components: 2, bands: 1, chi: 1, unlink: 'none', genusBound: null, ribbon: false });
    expect(c.after.pd).toHaveLength(2);
    expect(linkDeterminant(diagram(c.after.pd))).toBe(2n); // det(Hopf) = 2 (Lickorish, ch. 9; from memory)
  });

  it('two bands take the trefoil to the unknot: a genus-1 surface, and with s = 2 "g4 = 1"', () => {
    const c = bandCertificate(on(trefoil.pd, [4, 6], [2, 6]));
    expect(c).toMatchObject({ components: 1, bands: 2, chi: -1, surfaceComponents: 1, unlink: 'crossingless', genusBound: 1, ribbon: false });
    // s(positive trefoil) = 2 (docs/conventions.md; Rasmussen 2010, arXiv math/0402131): |s|/2 = 1 meets the bound.
    const s = rasmussenS(trefoil.pd, 'Q');
    expect(s).toBe(2);
    const lower = sliceGenusBounds(s, linkSignature(trefoil));
    expect(Math.max(lower.fromS, lower.fromSignature)).toBe(c.genusBound);
  });

  it('a link: one band takes the Hopf link to the unknot, an annulus joining both components (chi = 0, genus 0)', () => {
    const hopf = bandCertificate(on(trefoil.pd, [4, 6])).after.pd;
    const labels = [...new Set(hopf.flat())];
    const certs = labels.flatMap((a) => labels.map((b) => [a, b] as [number, number])).filter(([a, b]) => a < b).flatMap(([a, b]) => {
      try {
        return [bandCertificate(on(hopf, [a, b]))];
      } catch {
        return [];
      }
    });
    // n = 2 components, k = 1 surface component, c = 1, b = 1: chi = 0 and g = (2k - n - chi) / 2 = 0.
    const toUnknot = certs.find((c) => c.components === 1 && c.unlink !== 'none');
    expect(toUnknot).toMatchObject({ knotComponents: 2, surfaceComponents: 1, chi: 0, genusBound: 0, ribbon: false });
  });
});

describe('bands between split pieces', () => {
  // Two unknots with a kink each, side by side: a PD code does not place one piece in a face of
  // the other, so any two of their edges may be joined (the connected sum's band).
  const unlink = disjointUnion(fromBraid([1], 2), fromBraid([1], 2)); // [[1,1,2,2],[3,3,4,4]]
  it('a band joining the two-component unlink gives the unknot: an annulus, chi 0, genus 0', () => {
    expect(bandCertificate(on(unlink.pd, [1, 3]))).toMatchObject({ knotComponents: 2, components: 1, chi: 0, surfaceComponents: 1, genusBound: 0, ribbon: false, unlink: 'crossingless' });
  });
  it('its class is Delta(1) = 1 x + x 1, nonzero at q = 0 (Khovanov 2000, arXiv math/9908171)', () => {
    expect(surfaceClass(on(unlink.pd, [1, 3]))).toMatchObject({ h: 0, q: 0, zero: false });
  });
});

describe('ribbon presentations', () => {
  it('the built knots are what they are named (invariants from memory or from the knot table)', () => {
    // Square knot: V(T # mT) = V(T) V(mT), det 3 * 3 = 9 (common practice: both multiply under #).
    expect(jones(squareKnot).equals(jones(trefoil).mul(jones(mirror(trefoil))))).toBe(true);
    expect(linkDeterminant(squareKnot)).toBe(9n);
    expect(guessName(stevedore)?.name).toBe('6_1'); // shared/knot/names.ts (values from memory, recomputed there)
    expect(guessName(p33m2)?.name).toBe('8_20');
    // 9_46: Alexander polynomial -2t^-1 + 5 - 2t, determinant 9, signature 0 (from memory).
    expect(alexander(p33m3).polynomial.equals(Laurent.fromPairs([[-1, -2n], [0, 5n], [1, -2n]]))).toBe(true);
    expect(linkDeterminant(p33m3)).toBe(9n);
    expect(linkSignature(p33m3)).toBe(0);
  });

  it.each(ribbon.map((r) => [r.name, r.presentation] as const))('%s is certified ribbon', (_, p) => {
    const c = bandCertificate(p);
    expect(c).toMatchObject({ knotComponents: 1, components: 2, bands: 1, chi: 1, genusBound: 0, ribbon: true });
    expect(['crossingless', 'khovanov']).toContain(c.unlink);
  }, 60_000);

  it('past the Khovanov check\'s crossing limit the result is "too-large", with no genus bound', () => {
    const square = ribbon[0].presentation;
    expect(bandCertificate(square).unlink).toBe('khovanov'); // its after-bands diagram keeps crossings
    expect(bandCertificate(square, { maxCrossings: 0 })).toMatchObject({ unlink: 'too-large', genusBound: null, ribbon: false, maxCrossings: 0 });
  });

  it('a relabelling of the code (with the bands renamed) keeps every certificate', () => {
    const rng = seededRng(18);
    for (const { presentation: p } of ribbon) {
      const { pd, rename } = scramble(p.pd, rng);
      const renamed = { ...p, pd, saddles: p.saddles.map(({ a, b }) => ({ a: rename.get(a)!, b: rename.get(b)! })) };
      const [c, d] = [bandCertificate(p), bandCertificate(renamed)];
      expect({ ...d, after: d.after.components }).toEqual({ ...c, after: c.after.components });
    }
  }, 60_000);

  it('the after-bands diagram of a certificate "crossingless" has no crossing left', () => {
    const c = bandCertificate(on(p33m3.pd, [2, 12]));
    expect(c.unlink).toBe('crossingless');
    expect(c.after).toEqual({ pd: [], unknots: 2, components: 2 });
  });
});
