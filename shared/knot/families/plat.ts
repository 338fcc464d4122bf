// Closing a braid with caps: a plat closure when the caps pair neighbouring strands, and the
// pretzel closure when they pair each column with the next, around the back (Birman, "Braids,
// links and mapping class groups", 1974, for plats). The Gauss code is read by walking the
// strands; crossing types are those of the braid picture (docs/conventions.md): in sigma_k the strand
// from bottom right to top left passes under, in its inverse the one from bottom left.

import { Diagram } from '../diagram';
import { fromGauss } from '../gauss';
import { BraidWord, checkBraid } from '../braid';
import { PDError } from '../pd';

/** caps[i] is the position capped to position i (an involution without fixed points, non-crossing). */
export type Caps = readonly number[];

/** Caps (0,1), (2,3), ... */
export const neighbourCaps = (strands: number): Caps => Array.from({ length: strands }, (_, i) => i ^ 1);

export function capped(word: BraidWord, strands: number, top: Caps, bottom: Caps): Diagram {
  checkBraid(word, strands);
  for (const caps of [top, bottom]) {
    if (caps.length !== strands || caps.some((j, i) => caps[j] !== i || j === i)) throw new PDError(`caps must pair the ${strands} strand ends`);
  }
  const passes: { under: boolean; up: boolean }[][] = word.map(() => []);
  const done = new Array<boolean>(strands).fill(false);
  const components: number[][] = [];
  for (let start = 0; start < strands; start++) {
    if (done[start]) continue;
    const component: number[] = [];
    let position = start;
    do {
      done[position] = done[bottom[position]] = true;
      position = sweep(word, position, true, component, passes);
      position = sweep(word, top[position], false, component, passes);
      position = bottom[position];
    } while (position !== start);
    components.push(component);
  }
  // Both strands up or both down: the braid sign; one each way: its opposite.
  const signs = word.map((k, t) => Math.sign(k) * (passes[t][0].up === passes[t][1].up ? 1 : -1));
  return fromGauss({ components, signs });
}

// Walks one strand through the whole braid upwards or downwards; returns the final position.
function sweep(word: BraidWord, from: number, up: boolean, component: number[], passes: { under: boolean; up: boolean }[][]): number {
  let position = from;
  for (let i = 0; i < word.length; i++) {
    const t = up ? i : word.length - 1 - i;
    const k = word[t];
    const left = Math.abs(k) - 1;
    if (position !== left && position !== left + 1) continue;
    const fromRight = position === left + 1;
    // Positive letter: under-strand on the bottom-right/top-left diagonal.
    const under = k > 0 ? fromRight === up : fromRight !== up;
    passes[t].push({ under, up });
    component.push(under ? -(t + 1) : t + 1);
    position = fromRight ? left : left + 1;
  }
  return position;
}
