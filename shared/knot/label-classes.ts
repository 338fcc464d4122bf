// Classes of edge labels joined pair by pair: union-find with path compression (Galler and
// Fischer, "An improved equivalence algorithm", 1964; Tarjan, "Efficiency of a good but not
// linear set union algorithm", 1975). A label never joined is a class of its own.

export interface LabelClasses {
  /** The label naming the class of `l` (one of its labels). */
  readonly find: (l: number) => number;
  readonly join: (a: number, b: number) => void;
}

export function labelClasses(): LabelClasses {
  const parent = new Map<number, number>();
  const find = (l: number): number => {
    const p = parent.get(l) ?? l;
    if (p === l) return l;
    const root = find(p);
    parent.set(l, root);
    return root;
  };
  const join = (a: number, b: number): void => {
    const [ra, rb] = [find(a), find(b)];
    if (ra !== rb) parent.set(ra, rb);
  };
  return { find, join };
}
