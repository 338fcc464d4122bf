// Linking matrix of a framed link: lk(i, j) is half the sum of the signs of the crossings
// between components i and j (Rolfsen, Knots and Links, 5.D); the diagonal holds each
// component's framing (blackboard unless set), as in handle calculus.
import { Diagram, framingsOf } from './diagram';
import { orient } from './pd';

export function linkingMatrix(d: Diagram): number[][] {
  const o = orient(d.pd);
  const framings = framingsOf(d, o);
  const twice = framings.map(() => framings.map(() => 0));
  d.pd.forEach((x, c) => {
    const [i, j] = [o.componentOf.get(x[0])!, o.componentOf.get(x[1])!];
    if (i === j) return;
    twice[i][j] += o.signs[c];
    twice[j][i] += o.signs[c];
  });
  return twice.map((row, i) => row.map((v, j) => (i === j ? framings[i] : v / 2)));
}
