// Pretzel link P(a1, ..., ak): k columns of vertical half-twists, column i made of a_i letters
// sigma_(2i+1)^sign(a_i) on strands 2i, 2i+1, each column capped to the next at top and bottom,
// the last to the first around the back (common practice). P(a) is an unknot with kinks.

import { Diagram } from '../diagram';
import { PDError } from '../pd';
import { capped, Caps } from './plat';

export function pretzelLink(twists: readonly number[]): Diagram {
  if (twists.length === 0 || twists.some((a) => !Number.isInteger(a))) throw new PDError('a pretzel link needs at least one integer column');
  const strands = 2 * twists.length;
  const word = twists.flatMap((a, i) => new Array<number>(Math.abs(a)).fill((2 * i + 1) * Math.sign(a)));
  const caps: Caps = Array.from({ length: strands }, (_, i) => (i % 2 === 1 ? (i + 1) % strands : (i + strands - 1) % strands));
  return capped(word, strands, caps, caps);
}
