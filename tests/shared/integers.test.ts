// Integers printed with the true minus sign U+2212 (common practice in typesetting: a hyphen is
// not a minus), and with an explicit sign where the sign is the point.
import { minus, signed, subscript } from '@/shared/text/integers';

test('negative integers take U+2212, others print as they are', () => {
  expect([-12, -1, 0, 3].map(minus)).toEqual(['−12', '−1', '0', '3']);
  expect([-2, 0, 2].map(signed)).toEqual(['−2', '0', '+2']);
  expect(minus(-1).codePointAt(0)).toBe(0x2212);
});

test('digits become the subscript digits U+2080..U+2089, other characters stay', () => {
  // Unicode's subscript digits are U+2080 to U+2089 in order (common practice: the Unicode chart).
  expect(subscript('3,12')).toBe('₃,₁₂');
  expect([...subscript('0123456789')].map((c) => c.codePointAt(0)! - 0x2080)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
});
