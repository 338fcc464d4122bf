// The shared sketch page's Readout: the framed-link data as the owner saw it, and s with its
// slice-genus bounds when a run of the sketch computed it.
import { render, screen } from '@testing-library/react-native';
import { SharedSketchReadout } from '@/components/feed/SharedSketchReadout';
import type { GroupSketch } from '@/shared/api/feed';
import { fromBraid } from '@/shared/knot/braid';

jest.mock('expo-router', () => ({ useRouter: () => ({ push: jest.fn() }) }));

// The closure of [1,1,1] is the positive trefoil (docs/conventions.md, Braid word), here with framing -1.
const trefoil = fromBraid([1, 1, 1]);
const sketch: GroupSketch = {
  id: 's1',
  groupId: 'g1',
  title: 'Trefoil, -1-framed',
  tags: [],
  owner: { id: 'u1', displayName: 'Ada Lindqvist' },
  updatedAt: '2026-11-20T10:00:00.000Z',
  diagram: { pd: trefoil.pd.map(([a, b, c, d]) => [a, b, c, d]), unknots: 0, framings: [-1], geometry: null },
  photoThumbUrl: null,
  // V of the positive trefoil is t + t^3 - t^4 (docs/conventions.md, from memory).
  invariants: { crossings: 3, components: 1, jones: [[1, 1], [3, 1], [4, -1]], jonesText: 't + t³ − t⁴', computing: false },
  latestRun: { id: 'r1', kind: 'khovanov', finishedAt: '2026-11-20T11:00:00.000Z', summary: 'Kh over Q: q + q³ + h²q⁵ + h³q⁹', s: 2 },
  commentCount: 0,
  version: 3,
  seenAt: '',
  notes: '',
  photos: [],
  comments: [],
  forkedFrom: null,
  sameInvariants: [],
  sameInvariantsTotal: 0,
  myRole: 'member',
  can: { comment: true, moderate: false, uploadPhoto: true, fork: true, unshare: false },
};

test('s from a run with the slice-genus bounds, beside the framing', () => {
  render(<SharedSketchReadout s={sketch} />);
  expect(screen.getByText('Framings: 1: −1')).toBeTruthy();
  // docs/conventions.md: the positive trefoil has s = 2 and signature -2, so both bounds give 1.
  expect(screen.getByText('s = 2 over Q (Rasmussen, from a run)')).toBeTruthy();
  expect(screen.getByText('Slice genus ≥ 1: |s|/2 = 1, |σ|/2 = 1, the same bound')).toBeTruthy();
});

test('no s line when no run computed it', () => {
  render(<SharedSketchReadout s={{ ...sketch, latestRun: { ...sketch.latestRun!, s: undefined } }} />);
  expect(screen.queryByTestId('shared-s')).toBeNull();
  expect(screen.getByText(/Latest run: Kh over Q/)).toBeTruthy();
});
