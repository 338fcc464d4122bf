// The comment formatter: three markers, everything else literal (so nothing typed becomes markup),
// and CommentText rendering it as text nodes.
import { render, screen } from '@testing-library/react-native';
import { CommentText } from '@/components/feed/CommentText';
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

test('CommentText renders markup typed by a user as visible characters, with the bold span bold', () => {
  render(<CommentText body={'<img src=x onerror=alert(1)> **Kh**'} />);
  expect(screen.getByText('<img src=x onerror=alert(1)> ')).toBeTruthy();
  const bold = screen.getByText('Kh');
  expect(bold.props.style).toEqual(expect.arrayContaining([expect.objectContaining({ fontFamily: 'PlexSans-SemiBold' })]));
});
