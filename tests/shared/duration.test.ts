import { formatDuration } from '@/shared/text/duration';

describe('formatDuration', () => {
  it('picks the unit by size and never shows a negative time', () => {
    expect(formatDuration(850)).toBe('850 ms');
    expect(formatDuration(4240)).toBe('4.2 s');
    expect(formatDuration(119_999)).toBe('120.0 s');
    expect(formatDuration(12 * 60_000 + 20_000)).toBe('12 min');
    expect(formatDuration(-5)).toBe('0 ms');
    expect(formatDuration(Number.NaN)).toBe('0 ms');
  });
});
