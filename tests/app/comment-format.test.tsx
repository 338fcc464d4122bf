// The comment formatter: three markers, everything else literal (so nothing typed becomes markup).
import { formatComment } from '@/lib/comment-format';

test('bold, italic and code become spans; the rest stays as typed', () => {
  expect(formatComment('**Kh** is *thin* for `X[1,5,2,4]`')).toEqual([
    { text: 'Kh', bold: true },
    { text: ' is ' },
    { text: 'thin', italic: true },
    { text: ' for ' },
    { text: 'X[1,5,2,4]', code: true },
  ]);
});

test('HTML and unclosed markers are plain text', () => {
  expect(formatComment('<script>alert(1)</script> 2*3 **open')).toEqual([{ text: '<script>alert(1)</script> 2*3 **open' }]);
  expect(formatComment('line one\nline two')).toEqual([{ text: 'line one\nline two' }]);
});
