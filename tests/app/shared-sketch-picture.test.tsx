// The shared sketch's picture takes the width of its column (a phone's 390 px screen less the
// page's padding), up to a cap on wide panes, and stays small beside a board photo.
import { StyleSheet } from 'react-native';
import { fireEvent, render, screen } from '@testing-library/react-native';
import { SharedSketchPicture } from '@/components/feed/SharedSketchReadout';
import type { GroupSketch } from '@/shared/api/feed';
import { fromBraid } from '@/shared/knot/braid';

// The closure of [1,1,1] is the positive trefoil (docs/conventions.md, Braid word).
const trefoil = fromBraid([1, 1, 1]);
const sketch = {
  id: 's1',
  title: 'Trefoil',
  version: 1,
  diagram: { pd: trefoil.pd.map(([a, b, c, d]) => [a, b, c, d]), unknots: 0, framings: [null], geometry: null },
  invariants: { crossings: 3, components: 1, jones: null, jonesText: null, computing: false },
  photos: [],
} as unknown as GroupSketch;

const boxWidth = () => StyleSheet.flatten(screen.getByLabelText('Picture of Trefoil').props.style).width;

function layOut(width: number) {
  fireEvent(screen.getByTestId('shared-picture'), 'layout', { nativeEvent: { layout: { width, height: 400, x: 0, y: 0 } } });
}

test('the picture fills a phone column and stops at its cap on a wide pane', () => {
  render(<SharedSketchPicture s={sketch} />);
  layOut(358);
  expect(boxWidth()).toBe(350);
  layOut(900);
  expect(boxWidth()).toBe(480);
});

test('beside a board photo the picture stays small', () => {
  const photo = { url: '/api/photos/x/full', thumbUrl: '/api/photos/x/thumb', width: 400, height: 300 };
  render(<SharedSketchPicture s={{ ...sketch, photos: [photo] } as unknown as GroupSketch} />);
  layOut(358);
  expect(boxWidth()).toBe(220);
});
