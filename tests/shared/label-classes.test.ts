// labelClasses against the plain reference: two labels are in one class exactly when a path of
// joined pairs connects them (graph reachability; common practice), on seeded random joins.
import fc from 'fast-check';
import { labelClasses } from '@/shared/knot/label-classes';

function reachable(pairs: readonly [number, number][], from: number): Set<number> {
  const seen = new Set([from]);
  const todo = [from];
  while (todo.length) {
    const l = todo.pop()!;
    for (const [a, b] of pairs) {
      for (const [x, y] of [[a, b], [b, a]]) {
        if (x === l && !seen.has(y)) {
          seen.add(y);
          todo.push(y);
        }
      }
    }
  }
  return seen;
}

test('two labels share a class exactly when joined pairs connect them', () => {
  const label = fc.integer({ min: 1, max: 30 });
  fc.assert(
    fc.property(fc.array(fc.tuple(label, label), { maxLength: 40 }), (pairs) => {
      const { find, join } = labelClasses();
      for (const [a, b] of pairs) join(a, b);
      const labels = Array.from({ length: 30 }, (_, i) => i + 1);
      for (const a of labels) {
        const reach = reachable(pairs, a);
        const same = labels.filter((b) => find(b) === find(a));
        if (same.join() !== labels.filter((b) => reach.has(b)).join()) return false;
        if (!reach.has(find(a))) return false; // the class is named by one of its own labels
      }
      return true;
    }),
    { seed: 20261204, numRuns: 200 },
  );
});
