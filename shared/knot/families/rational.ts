// Rational (2-bridge) links from a continued fraction [a1, ..., ak], value a1 + 1/(a2 + 1/(...)),
// as the 4-plat sigma_2^a1 sigma_1^-a2 sigma_2^a3 ... (Conway's normal form; Burde and
// Zieschang, "Knots", ch. 12). For even k the top caps pair strands (1,2) and (0,3), so the last
// twists (on strands 0,1) are not absorbed by a cap. [n] is T(2, n); [] is rejected.

import { Diagram } from '../diagram';
import { PDError } from '../pd';
import { capped, neighbourCaps } from './plat';

export function rationalLink(fraction: readonly number[]): Diagram {
  if (fraction.length === 0 || fraction.some((a) => !Number.isInteger(a))) throw new PDError('a continued fraction needs at least one integer entry');
  const word = fraction.flatMap((a, i) => new Array<number>(Math.abs(a)).fill(i % 2 === 0 ? 2 * Math.sign(a) : -Math.sign(a)));
  const top = fraction.length % 2 === 1 ? neighbourCaps(4) : [3, 2, 1, 0];
  return capped(word, 4, top, neighbourCaps(4));
}
