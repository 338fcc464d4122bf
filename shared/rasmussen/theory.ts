// Bar-Natan's deformed theory: the Frobenius algebra A = k[H][x]/(x^2 - Hx), H of q-degree -2,
// counit e(1) = 0, e(x) = 1, Delta(1) = 1 x + x 1 - H 1 1 (Bar-Natan, "Khovanov's homology for
// tangles and cobordisms", 2005, arXiv math/0410495; over F2 Turner's theory, arXiv math/0411225;
// over Q it is Lee's theory after x -> x - H/2, Bar-Natan and Morrison, arXiv math/0606542).
// Surfaces reduce to dotted discs (dot = x) as in Khovanov's theory, now with H terms. Every
// morphism is homogeneous, so the power of H of each term is fixed by its degree and only the
// coefficient in k is kept: at H = 0 this is Khovanov's theory.
//
// In the basis a = x, b = x - H of A: a^2 = Ha, b^2 = -Hb, ab = 0, and a handle is 2x - H = a + b.
// A connected piece with d dots, e dual dots (x - H, from delooping) and genus g is therefore
// x^d (x - H)^e (2x - H)^g = alpha 1 + beta x, pushed to its boundary circles by the iterated
// coproduct: Delta^n(x) = x...x and Delta^n(1) = sum over nonempty sets U of circles of
// (-H)^(|U|-1) (undotted on U, dotted elsewhere); with no boundary it is e(.) = beta.

import { Piece, popcount, Theory } from '../khovanov/cobordism';

/** [alpha, beta] of the piece's element alpha 1 + beta x (powers of H implicit). */
function element(genus: number, d: number, e: number): [number, number] {
  if (d > 0) return e > 0 ? [0, 0] : [0, 1]; // x (x - H) = 0; a^(d+g) = H^(d+g-1) a
  if (e > 0) {
    const sign = (e + genus) % 2 ? 1 : -1; // b^(e+g) = (-H)^(e+g-1) b
    return [-sign, sign];
  }
  return genus % 2 ? [-1, 2] : [1, 0]; // (a + b)^g = H^(g-1) (2x - H) for odd g, H^g for even g
}

function pieceTerms({ genus, boundary }: Piece, d: number, e: number): [number, number][] {
  const [alpha, beta] = element(genus, d, e);
  const terms: [number, number][] = [];
  if (beta !== 0) terms.push([boundary, beta]);
  if (alpha !== 0 && boundary !== 0) {
    for (let undotted = boundary; undotted; undotted = (undotted - 1) & boundary) {
      terms.push([boundary & ~undotted, popcount(undotted) % 2 ? alpha : -alpha]);
    }
  }
  return terms;
}

export const deformedTheory: Theory = {
  reduce(pieces, dots, capDots) {
    let terms: [number, number][] = [[0, 1]];
    for (let k = 0; k < pieces.length && terms.length > 0; k++) {
      const own = pieceTerms(pieces[k], dots[k], capDots?.[k] ?? 0);
      const next: [number, number][] = [];
      for (const [m, c] of terms) for (const [m2, c2] of own) next.push([m | m2, c * c2]);
      terms = next;
    }
    return terms;
  },
};
