// A feed card: the Readout summary with the Jones polynomial (plain text on native, where the
// TeX component has no KaTeX), the latest run as the server summarises it.
import { render, screen } from '@testing-library/react-native';
import { FeedCard } from '@/components/feed/FeedCard';
import type { FeedItem } from '@/shared/api/feed';

const item: FeedItem = {
  id: 's1',
  groupId: 'g1',
  title: 'Trefoil from the board',
  tags: ['torus knot'],
  owner: { id: 'u1', displayName: 'Ada Lindqvist' },
  updatedAt: '2026-11-20T10:00:00.000Z',
  diagram: { pd: [], unknots: 0, framings: [], geometry: null },
  photoThumbUrl: null,
  // V of the positive trefoil is t + t^3 - t^4 (docs/conventions.md, from memory).
  invariants: { crossings: 3, components: 1, jones: [[1, 1], [3, 1], [4, -1]], jonesText: 't + t³ − t⁴', computing: false },
  latestRun: { id: 'r1', kind: 'khovanov', finishedAt: '2026-11-20T11:00:00.000Z', summary: 'Kh over Z: q + q³ + h²q⁵ + h³q⁹' },
  commentCount: 2,
  version: 7,
};

test('the card shows crossings, Jones, the latest run and the comment count', () => {
  render(<FeedCard item={item} onOpen={() => undefined} />);
  expect(screen.getByText('3 crossings')).toBeTruthy();
  expect(screen.getByText('V = t + t³ − t⁴')).toBeTruthy();
  expect(screen.getByText('Kh over Z: q + q³ + h²q⁵ + h³q⁹')).toBeTruthy();
  expect(screen.getByText('2 comments')).toBeTruthy();
  expect(screen.getByRole('link', { name: 'Open Trefoil from the board' })).toBeTruthy();
});

test('the card shows s when a run computed it, and nothing of s otherwise', () => {
  // docs/conventions.md: the positive trefoil has s = 2.
  const view = render(<FeedCard item={{ ...item, latestRun: { ...item.latestRun!, s: 2 } }} onOpen={() => undefined} />);
  expect(screen.getByText('s = 2')).toBeTruthy();
  // Its mirror has s = -2 (s changes sign under mirroring, Rasmussen 2010, arXiv math/0402131),
  // printed with a minus sign as the Readout prints it, not a hyphen.
  view.rerender(<FeedCard item={{ ...item, latestRun: { ...item.latestRun!, s: -2 } }} onOpen={() => undefined} />);
  expect(screen.getByText('s = −2')).toBeTruthy();
  view.rerender(<FeedCard item={item} onOpen={() => undefined} />);
  expect(screen.queryByText(/^s = /)).toBeNull();
});

test('the card says the Jones polynomial is computing while the server has not got it yet', () => {
  render(<FeedCard item={{ ...item, invariants: { crossings: 3, components: null, jones: null, jonesText: null, computing: true } }} onOpen={() => undefined} />);
  expect(screen.getByText('Jones polynomial: computing…')).toBeTruthy();
  expect(screen.queryByText(/^V = /)).toBeNull();
});
