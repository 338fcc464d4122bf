// S15: the cursor a pull page answers. Rows are the visible changes after the request's cursor
// in seq order, read with one more than the limit; head is the largest seq in the log, read in
// the same transaction, so invisible changes past the last row still move the cursor on.
export interface Page<T> {
  rows: T[];
  cursor: number;
  hasMore: boolean;
}

export function pageOf<T extends { seq: number }>(rows: readonly T[], limit: number, after: number, head: number): Page<T> {
  const hasMore = rows.length > limit;
  const page = rows.slice(0, limit);
  const last = page.length > 0 ? page[page.length - 1].seq : after;
  return { rows: page, cursor: hasMore ? last : Math.max(last, head, after), hasMore };
}
