// Braid words and their closures. A word is a list of nonzero integers: k > 0 is sigma_k, a
// positive crossing of strands k and k+1, and k < 0 its inverse (docs/conventions.md).
// Strands run upwards; the closure returns them around the right-hand side, which is planar.

import { Diagram } from './diagram';
import { fromGauss } from './gauss';
import { PDError } from './pd';

export type BraidWord = readonly number[];

export function checkBraid(word: BraidWord, strands = braidStrands(word)): void {
  word.forEach((k, i) => {
    if (!Number.isInteger(k) || k === 0) throw new PDError(`braid letter ${i + 1} must be a nonzero integer, got ${k}`);
    if (Math.abs(k) >= strands) throw new PDError(`braid letter ${k} needs ${Math.abs(k) + 1} strands, only ${strands} given`);
  });
}

/** The least number of strands the word needs (1 for the empty word). */
export function braidStrands(word: BraidWord): number {
  return word.reduce((m, k) => Math.max(m, Math.abs(k) + 1), 1);
}

/** Parses "1 -2 1" or "1, -2, 1". */
export function parseBraid(text: string): number[] {
  const parts = text.trim().split(/[\s,]+/).filter((s) => s !== '');
  const word = parts.map((s) => {
    if (!/^-?\d+$/.test(s)) throw new PDError(`braid letter "${s}" is not an integer`);
    return Number(s);
  });
  checkBraid(word);
  return word;
}

/**
 * The closure of a braid on `strands` strands. For sigma_k the strand coming from the right
 * passes under (so the crossing is positive); for its inverse the strand from the left does.
 * A strand position that no letter touches closes to a crossingless unknot.
 */
export function fromBraid(word: BraidWord, strands = braidStrands(word)): Diagram {
  checkBraid(word, strands);
  const done = new Array<boolean>(strands).fill(false);
  const components: number[][] = [];
  for (let start = 0; start < strands; start++) {
    if (done[start]) continue;
    const passes: number[] = [];
    let position = start;
    do {
      done[position] = true;
      word.forEach((k, t) => {
        const left = Math.abs(k) - 1;
        if (position !== left && position !== left + 1) return;
        const fromRight = position === left + 1;
        const isUnder = k > 0 ? fromRight : !fromRight;
        passes.push(isUnder ? -(t + 1) : t + 1);
        position = fromRight ? left : left + 1;
      });
    } while (position !== start);
    components.push(passes);
  }
  return fromGauss({ components, signs: word.map(Math.sign) });
}
