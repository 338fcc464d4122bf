// Twist knots: n half-twists and a clasp, the rational knot [n, 2] (Rolfsen, "Knots and
// Links", ch. 3): n = 1 the trefoil, 2 the figure-eight, 3 the knot 5_2, 0 the unknot.

import { Diagram } from '../diagram';
import { rationalLink } from './rational';

export const twistKnot = (n: number): Diagram => rationalLink([n, 2]);
