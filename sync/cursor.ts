// S15: the cursor a pull page answers. Rows are the visible changes after the request's cursor
// in seq order, read with one more than the limit; head is the largest seq in the log, read
// before the rows, so invisible changes past the last row still move the cursor on. A page
// also stops once its rows pass `maxBytes` (always at least one row), so heavy drawings do not
// make pages of many megabytes.
export interface Page<T> {
  rows: T[];
  cursor: number;
  hasMore: boolean;
}

export interface PageLimits<T> {
  limit: number;
  maxBytes?: number;
  sizeOf?: (row: T) => number;
}

export function pageOf<T extends { seq: number }>(rows: readonly T[], limits: PageLimits<T>, after: number, head: number): Page<T> {
  const { limit, maxBytes = Infinity, sizeOf = () => 0 } = limits;
  let bytes = 0;
  let n = 0;
  while (n < Math.min(limit, rows.length) && (n === 0 || bytes + sizeOf(rows[n]) <= maxBytes)) bytes += sizeOf(rows[n++]);
  const hasMore = rows.length > n;
  const page = rows.slice(0, n);
  const last = page.length > 0 ? page[page.length - 1].seq : after;
  return { rows: page, cursor: hasMore ? last : Math.max(last, head, after), hasMore };
}
