import { nextPath } from '@/lib/next-path';

// Open-redirect probes: what a browser resolves to another origin must never be followed
// (WHATWG URL parsing treats "\" like "/" and drops tabs and newlines: common practice).
describe('nextPath', () => {
  it('keeps paths of this app, with their query and hash', () => {
    expect(nextPath('/runs/abc?ring=Z#t')).toBe('/runs/abc?ring=Z#t');
    expect(nextPath(['/feed', '/other'])).toBe('/feed');
  });

  it.each(['//evil.example', '/\\evil.example', '/\\/evil.example', '/\t/evil.example', 'https://evil.example', 'runs', ''])(
    'sends %j to the sketchbook',
    (next) => expect(nextPath(next)).toBe('/sketches'),
  );

  it('sends a missing value to the sketchbook', () => expect(nextPath(undefined)).toBe('/sketches'));
});
