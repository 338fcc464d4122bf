// The comment renderer: Markdown by markdown-it with HTML off and $TeX$ between dollars
// (shared/text/comment-markdown.ts), drawn by CommentText as text nodes and maths.
import { render, screen } from '@testing-library/react-native';
import { CommentText } from '@/components/feed/CommentText';
import { commentBlocks, commentPlainText } from '@/shared/text/comment-markdown';

test('bold, italic, code and maths become spans; the rest stays as typed', () => {
  expect(commentBlocks('**Kh** is *thin* for `X[1,5,2,4]`, so $s = -\\sigma$')).toEqual([{
    kind: 'paragraph',
    spans: [
      { kind: 'text', text: 'Kh', bold: true },
      { kind: 'text', text: ' is ' },
      { kind: 'text', text: 'thin', italic: true },
      { kind: 'text', text: ' for ' },
      { kind: 'text', text: 'X[1,5,2,4]', code: true },
      { kind: 'text', text: ', so ' },
      { kind: 'math', tex: 's = -\\sigma' },
    ],
  }]);
});

test('dollars as money stay text (no space inside, no digit after the closing one); \\$ is a dollar', () => {
  expect(commentBlocks('costs $5 and $6, or $ x $')[0].spans).toEqual([{ kind: 'text', text: 'costs $5 and $6, or $ x $' }]);
  expect(commentBlocks('\\$q$ and $q$')[0].spans).toEqual([{ kind: 'text', text: '$q$ and ' }, { kind: 'math', tex: 'q' }]);
});

test('HTML, unclosed markers and javascript: links are plain text; lists keep their markers', () => {
  expect(commentBlocks('<script>alert(1)</script> 2*3 **open [x](javascript:alert(1))')[0].spans)
    .toEqual([{ kind: 'text', text: '<script>alert(1)</script> 2*3 **open [x](javascript:alert(1))' }]);
  expect(commentBlocks('1. first\n2. second').map((b) => [b.marker, b.spans])).toEqual([
    ['1.', [{ kind: 'text', text: 'first' }]],
    ['2.', [{ kind: 'text', text: 'second' }]],
  ]);
  expect(commentBlocks('[notes](https://example.org/a)')[0].spans).toEqual([{ kind: 'text', text: 'notes', href: 'https://example.org/a' }]);
  expect(commentPlainText('line one\nline **two**')).toBe('line one\nline two');
});

test('CommentText renders markup typed by a user as visible characters, bold bold, maths by the TeX component', () => {
  render(<CommentText body={'<img src=x onerror=alert(1)> **Kh** and $q^{-1}$'} />);
  expect(screen.getByText('<img src=x onerror=alert(1)> ')).toBeTruthy();
  const bold = screen.getByText('Kh');
  expect(bold.props.style).toEqual(expect.arrayContaining([expect.objectContaining({ fontFamily: 'PlexSans-SemiBold' })]));
  // Native has no KaTeX: the TeX component shows the source in the maths face's place.
  expect(screen.getByText('q^{-1}')).toBeTruthy();
});
