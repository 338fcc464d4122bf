// Divide and conquer in Bar-Natan's local algorithm ("Fast Khovanov homology computations",
// arXiv math/0606318, Sect. 6): the crossings are split into parts (sub-tangles), each part's
// complex is built and simplified on its own, then the parts are glued one after another
// (tensor.ts) and the result simplified after each gluing. A part whose code equals an earlier
// one's up to renaming labels (every crossing's grid in a cable) is computed once: a tangle's
// complex depends on its code only through which ends carry equal labels, so the copy's complex
// is the first one's with its ends renamed.

import { Crossing, PDCode } from '../knot/pd';
import { TangleComplex } from './complex';
import { simplify } from './simplify';
import { addCrossing, tensor } from './tensor';

/** Sees the complex after each step, and how many crossings that step added. */
export type Step<T> = (cx: TangleComplex<T>, added: number) => void;

/** Adds the crossings code[k], k in `order`, to `cx`, simplifying after each. */
export function addInOrder<T>(cx: TangleComplex<T>, code: PDCode, order: readonly number[], check: () => void, step: Step<T> = () => {}): TangleComplex<T> {
  for (const k of order) {
    check();
    cx = addCrossing(cx, code[k]);
    simplify(cx, check);
    step(cx, 1);
  }
  return cx;
}

/** The crossings of a part with every label replaced by the order of its first appearance. */
function shape(crossings: readonly Crossing[]): { key: string; labels: number[] } {
  const index = new Map<number, number>();
  const labels: number[] = [];
  const renamed = crossings.map((x) =>
    x.map((l) => {
      if (!index.has(l)) {
        index.set(l, labels.length);
        labels.push(l);
      }
      return index.get(l)!;
    }),
  );
  return { key: renamed.join(';'), labels };
}

/**
 * The complex of the tangle code[parts[0]] u code[parts[1]] u ..., each part's crossings added
 * in the order listed, the parts glued in the order listed; `step` sees every gluing.
 */
export function glueParts<T>(empty: TangleComplex<T>, code: PDCode, parts: readonly (readonly number[])[], check: () => void, step: Step<T> = () => {}): TangleComplex<T> {
  const built = new Map<string, { cx: TangleComplex<T>; labels: number[] }>();
  let cx = empty;
  for (const part of parts) {
    const { key, labels } = shape(part.map((k) => code[k]));
    let first = built.get(key);
    if (!first) {
      first = { cx: addInOrder(empty, code, part, check), labels };
      built.set(key, first);
    }
    // The first copy's label at each first appearance is this copy's label there.
    const rename = new Map(first.labels.map((l, i) => [l, labels[i]]));
    check();
    cx = tensor(cx, first.cx, first.cx.boundary.map((l) => rename.get(l)!));
    simplify(cx, check);
    step(cx, part.length);
  }
  return cx;
}
