// The Jones polynomial of a feed item, typeset (KaTeX on web), from the summary the server sends.
import { TeX } from '@/components/ui/Math';
import type { InvariantSummary } from '@/shared/api/feed';
import { Laurent } from '@/shared/poly/laurent';

export function Jones({ inv, lhs = 'V' }: { inv: InvariantSummary; lhs?: string }) {
  if (!inv.jones) return null;
  const v = Laurent.fromJSON(inv.jones);
  return <TeX tex={`${lhs} = ${v.format('t', 'latex')}`} text={`${lhs} = ${inv.jonesText ?? v.format('t', 'unicode')}`} />;
}
