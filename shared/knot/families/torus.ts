// Torus link T(p, q) as the closure of the braid (sigma_1 ... sigma_(|p|-1))^|q| on |p| strands,
// inverted letters when p q < 0 (common practice). T(p, 0) is the |p|-component unlink; p = 0 is rejected.

import { fromBraid } from '../braid';
import { Diagram } from '../diagram';
import { PDError } from '../pd';

export function torusLink(p: number, q: number): Diagram {
  if (!Number.isInteger(p) || !Number.isInteger(q) || p === 0) throw new PDError(`T(p, q) needs integers with p != 0, got T(${p}, ${q})`);
  const sign = Math.sign(p) * Math.sign(q);
  const word: number[] = [];
  for (let r = 0; r < Math.abs(q); r++) for (let k = 1; k < Math.abs(p); k++) word.push(sign * k);
  return fromBraid(word, Math.abs(p));
}
