// A run's date: the runs table's short form and the run page's long form write the same time
// the same way (the table said "09:49 PM" beside the page's "9:49 PM").
import { runDate } from '@/lib/run-format';

test('the short date ends with the time as the long date writes it', () => {
  for (const iso of ['2026-12-04T21:49:00.000Z', '2026-12-04T09:05:00.000Z', '2026-01-31T00:30:00.000Z']) {
    const long = runDate(iso);
    const short = runDate(iso, true);
    const time = (d: string) => d.match(/\d+:\d{2}.*$/)![0];
    expect(time(short)).toBe(time(long));
    expect(short.length).toBeLessThan(long.length); // no year
  }
});
