// Braid words up to Markov equivalence: braid relations, conjugation and (de)stabilisation
// leave the closure's link type unchanged (Markov's theorem; Birman, "Braids, links and
// mapping class groups", 1974).

import { checkBraid } from '../braid';
import { PDError } from '../pd';
import { Rng } from './random';

export interface Braid {
  readonly word: readonly number[];
  readonly strands: number;
}

/** Moves the first letter to the end (conjugation by it). */
export const conjugate = (b: Braid): Braid => (b.word.length === 0 ? b : { ...b, word: [...b.word.slice(1), b.word[0]] });

/** Adds a strand and the letter sigma_n^(+-1) crossing it. */
export const stabilise = (b: Braid, sign: 1 | -1): Braid => ({ word: [...b.word, sign * b.strands], strands: b.strands + 1 });

/** Undoes a stabilisation: the last letter is the only one using the last strand. */
export function destabilise(b: Braid): Braid {
  const last = b.word[b.word.length - 1];
  if (last === undefined || Math.abs(last) !== b.strands - 1 || b.word.slice(0, -1).some((k) => Math.abs(k) === b.strands - 1)) {
    throw new PDError('destabilisation needs the last letter to be the only one on the last strand');
  }
  return { word: b.word.slice(0, -1), strands: b.strands - 1 };
}

/** Inserts sigma_k sigma_k^-1 (or its inverse) at position i. */
export const insertInverses = (b: Braid, i: number, k: number): Braid => {
  checkBraid([k], b.strands);
  return { ...b, word: [...b.word.slice(0, i), k, -k, ...b.word.slice(i)] };
};

/**
 * A braid relation at position i when one applies: far letters commute, and
 * sigma_k sigma_(k+1) sigma_k = sigma_(k+1) sigma_k sigma_(k+1) (same signs), and a letter next
 * to its inverse cancels. Returns undefined when none applies at i.
 */
export function braidRelation(b: Braid, i: number): Braid | undefined {
  const w = b.word;
  const [x, y, z] = [w[i], w[i + 1], w[i + 2]];
  if (x === undefined || y === undefined) return undefined;
  if (x === -y) return { ...b, word: [...w.slice(0, i), ...w.slice(i + 2)] };
  if (Math.abs(Math.abs(x) - Math.abs(y)) >= 2) return { ...b, word: [...w.slice(0, i), y, x, ...w.slice(i + 2)] };
  if (z === x && Math.sign(x) === Math.sign(y) && Math.abs(Math.abs(x) - Math.abs(y)) === 1) {
    return { ...b, word: [...w.slice(0, i), y, x, y, ...w.slice(i + 3)] };
  }
  return undefined;
}

/** One random Markov move or braid relation. */
export function randomMarkovMove(b: Braid, rng: Rng): Braid {
  const choice = Math.floor(rng() * 5);
  const i = Math.floor(rng() * (b.word.length + 1));
  if (choice === 0) return conjugate(b);
  if (choice === 1) return stabilise(b, rng() < 0.5 ? 1 : -1);
  if (choice === 2) {
    try {
      return destabilise(b);
    } catch {
      return conjugate(b);
    }
  }
  if (choice === 3 && b.strands > 1) return insertInverses(b, i, (1 + Math.floor(rng() * (b.strands - 1))) * (rng() < 0.5 ? 1 : -1));
  return braidRelation(b, i) ?? conjugate(b);
}
