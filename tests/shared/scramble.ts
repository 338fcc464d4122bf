// The same diagram written another way: labels renamed by a random bijection onto other integers,
// crossings listed in a random order (Fisher-Yates shuffles; common practice). A component that
// passes only over is oriented by its labels increasing along it (docs/conventions.md), so its
// new labels keep that cyclic order, starting at a random place.
import { Rng } from '@/shared/knot/moves/random';
import { mapLabels, orient, PDCode } from '@/shared/knot/pd';

function shuffle<T>(items: T[], rng: Rng): T[] {
  for (let k = items.length - 1; k > 0; k--) {
    const j = Math.floor(rng() * (k + 1));
    [items[k], items[j]] = [items[j], items[k]];
  }
  return items;
}

export function scramble(pd: PDCode, rng: Rng): { pd: PDCode; rename: Map<number, number> } {
  const under = new Set(pd.flatMap((x) => [x[0], x[2]]));
  const targets = shuffle(Array.from({ length: 2 * pd.length }, (_, k) => 5 * k - 40), rng);
  const rename = new Map<number, number>();
  for (const walk of orient(pd).components) {
    const mine = targets.splice(0, walk.length);
    if (walk.every((l) => !under.has(l))) {
      mine.sort((p, q) => p - q);
      const turn = Math.floor(rng() * mine.length);
      mine.push(...mine.splice(0, turn));
    }
    walk.forEach((l, k) => rename.set(l, mine[k]));
  }
  return { pd: shuffle(pd.map((x) => mapLabels(x, (l) => rename.get(l)!)), rng), rename };
}
