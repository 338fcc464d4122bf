// The same diagram written another way: labels renamed by a random bijection onto other integers,
// crossings listed in a random order (Fisher-Yates shuffles; common practice).
import { Rng } from '@/shared/knot/moves/random';
import { mapLabels, PDCode } from '@/shared/knot/pd';

function shuffle<T>(items: T[], rng: Rng): T[] {
  for (let k = items.length - 1; k > 0; k--) {
    const j = Math.floor(rng() * (k + 1));
    [items[k], items[j]] = [items[j], items[k]];
  }
  return items;
}

export function scramble(pd: PDCode, rng: Rng): { pd: PDCode; rename: Map<number, number> } {
  const labels = [...new Set(pd.flat())];
  const targets = shuffle(labels.map((_, k) => 5 * k - 40), rng);
  const rename = new Map(labels.map((l, k) => [l, targets[k]]));
  return { pd: shuffle(pd.map((x) => mapLabels(x, (l) => rename.get(l)!)), rng), rename };
}
