// Determinant and signature from Goeritz matrices (C. McA. Gordon and R. A. Litherland, "On
// the signature of a link", Invent. Math. 47, 1978): sigma = sign(G) - mu, det = |det G|.
// Corners 0..3 of X[a,b,c,d] lie between a-b, b-c, c-d, d-a. With the white faces at corners
// {0,2} the incidence eta is +1, at {1,3} it is -1 (rotating the under-strand counterclockwise
// sweeps the white corners when eta = +1). A crossing is of type II (its band twists against
// the orientation) exactly when its sign equals eta; mu sums eta over those.
// Convention: the positive (right-handed) trefoil has signature -2, as for V + V^T in
// Lickorish, An Introduction to Knot Theory, ch. 6.
import { determinant, integers } from './bareiss';
import { facesOf } from './faces';
import type { Diagram } from './diagram';
import { orient, type Oriented } from './pd';
import { signature } from './symmetric';

export interface GoeritzForm {
  /** The Goeritz matrix of one connected piece, the row and column of one white face removed. */
  readonly matrix: bigint[][];
  /** Gordon-Litherland correction mu of that piece. */
  readonly mu: number;
}

/** One form per connected piece of the diagram; `white` picks which colour class is white. */
export function goeritzForms(o: Oriented, white: 0 | 1 = 0): GoeritzForm[] {
  const { faceOf, colour, pieces } = facesOf(o.pd);
  return pieces.map((piece) => {
    const whites = [...new Set(piece.flatMap((c) => faceOf[c]))].filter((f) => colour[f] === white);
    const index = new Map(whites.map((f, i) => [f, i]));
    const full = whites.map(() => whites.map(() => 0n));
    let mu = 0;
    for (const c of piece) {
      const eta = colour[faceOf[c][0]] === white ? 1 : -1;
      const [f, g] = eta === 1 ? [faceOf[c][0], faceOf[c][2]] : [faceOf[c][1], faceOf[c][3]];
      if (o.signs[c] === eta) mu += eta;
      if (f === g) continue;
      const [i, j] = [index.get(f)!, index.get(g)!];
      const e = BigInt(eta);
      full[i][j] -= e;
      full[j][i] -= e;
      full[i][i] += e;
      full[j][j] += e;
    }
    return { matrix: full.slice(1).map((row) => row.slice(1)), mu };
  });
}

/** The determinant |det G|; 0 when the diagram falls apart (pieces or free unknots), 1 for the unknot. */
export function linkDeterminant(d: Diagram): bigint {
  const forms = goeritzForms(orient(d.pd));
  const pieces = forms.length + d.unknots;
  // The empty diagram gets 1, like its Jones polynomial: |V(-1)| = det holds there too.
  if (pieces !== 1) return pieces === 0 ? 1n : 0n;
  if (forms.length === 0) return 1n;
  const det = determinant(integers, forms[0].matrix);
  return det < 0n ? -det : det;
}

/** Signature of the oriented link (additive over the pieces of a split diagram; unknots add 0). */
export function linkSignature(d: Diagram, white: 0 | 1 = 0): number {
  return goeritzForms(orient(d.pd), white).reduce((s, form) => s + signature(form.matrix) - form.mu, 0);
}
