// Integers printed with the true minus sign U+2212 (common practice in typesetting: a hyphen is
// not a minus), and with an explicit sign where the sign is the point.
import { minus, signed } from '@/shared/text/integers';

test('negative integers take U+2212, others print as they are', () => {
  expect([-12, -1, 0, 3].map(minus)).toEqual(['−12', '−1', '0', '3']);
  expect([-2, 0, 2].map(signed)).toEqual(['−2', '0', '+2']);
  expect(minus(-1).codePointAt(0)).toBe(0x2212);
});
