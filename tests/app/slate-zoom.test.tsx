// The Slate's camera under zoom gestures, checked on random views: a zoom about a point leaves the
// world point under it in place (the definition of zooming about a point, common practice), a
// pinch that does not scale is a pure pan, and a wheel turn undone by the opposite turn gives
// the view back. A fitted view follows the board's width: the drawing is fitted again (an empty
// board keeps what it showed), and the reverse resize gives the first fit back; a new height
// alone, or any resize once zoomed by hand, only keeps the centre.
import { seededRng } from '@/shared/knot/moves/random';
import { analyse } from '@/shared/drawing/analyse';
import { fromBraid } from '@/shared/knot/braid';
import { badgePill, fitView, strandPictures, toWorld } from '@/lib/slate/picture';
import { docFromDiagram } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';
import { fitBaseOf, pinchedView, refit, wheelView, zoomAbout } from '@/lib/slate/zoom';

const rng = seededRng(7);
const between = (a: number, b: number) => a + (b - a) * rng();
const randomView = () => ({ k: between(0.5, 3), x: between(-400, 400), y: between(-400, 400) });
const randomPoint = () => ({ x: between(0, 1440), y: between(0, 900) });

test('a zoom keeps the world point under its centre where it is', () => {
  for (let i = 0; i < 200; i++) {
    const [v, c, f] = [randomView(), randomPoint(), between(0.2, 2.5)];
    const before = toWorld(v, c);
    const after = toWorld(zoomAbout(v, f, c), c);
    expect(after.x).toBeCloseTo(before.x, 6);
    expect(after.y).toBeCloseTo(before.y, 6);
  }
});

test('the scale stays within 0.15x and 8x however far one zooms', () => {
  const v = randomView();
  expect(zoomAbout(v, 1e6, randomPoint()).k).toBe(8);
  expect(zoomAbout(v, 1e-6, randomPoint()).k).toBe(0.15);
});

test('a pinch without scaling pans by the fingers; with scaling its focal point follows the fingers', () => {
  for (let i = 0; i < 100; i++) {
    const [from, focal, shift] = [randomView(), randomPoint(), { x: between(-100, 100), y: between(-100, 100) }];
    expect(pinchedView({ from, scale: 1, focal, shift })).toEqual({ k: from.k, x: from.x + shift.x, y: from.y + shift.y });
    const v = pinchedView({ from, scale: between(0.5, 2), focal, shift });
    const under = toWorld(v, { x: focal.x + shift.x, y: focal.y + shift.y });
    expect(under.x).toBeCloseTo(toWorld(from, focal).x, 6);
    expect(under.y).toBeCloseTo(toWorld(from, focal).y, 6);
  }
});

test('a wheel turn and the opposite turn at the same pointer give the view back', () => {
  for (let i = 0; i < 100; i++) {
    const [v, at, dy] = [randomView(), randomPoint(), between(-300, 300)];
    const back = wheelView(wheelView(v, dy, at), -dy, at);
    expect(back.k).toBeCloseTo(v.k, 9);
    expect(back.x).toBeCloseTo(v.x, 6);
    expect(back.y).toBeCloseTo(v.y, 6);
  }
});

const randomSize = () => ({ width: between(200, 1440), height: between(150, 900) });
const randomPoints = () => Array.from({ length: 12 }, () => ({ x: between(-500, 500), y: between(-300, 300) }));

test('a fit base gives the fit of the drawing at any board size; an empty board keeps its view', () => {
  for (let i = 0; i < 200; i++) {
    const [v, points, at, to] = [randomView(), randomPoints(), randomSize(), randomSize()];
    const base = fitBaseOf(points, v, at.width, at.height);
    expect(refit(base, to.width, to.height)).toEqual(fitView(points, to.width, to.height));
    const empty = refit(fitBaseOf([], v, at.width, at.height), at.width, at.height);
    expect(empty.k).toBeCloseTo(v.k, 9);
    expect(empty.x).toBeCloseTo(v.x, 6);
    expect(empty.y).toBeCloseTo(v.y, 6);
  }
});

test('the Slate: a new width refits, its reverse gives the first fit back; a new height or a hand zoom keeps the scale and the centre', () => {
  const s = () => useSlate.getState();
  const points = randomPoints();
  s().resize(390, 300);
  s().markFitted(s().fitRequest, fitBaseOf(points, s().view, 390, 300));
  const phone = s().view;
  expect(phone).toEqual(fitView(points, 390, 300));
  s().resize(1440, 900);
  expect(s().view).toEqual(fitView(points, 1440, 900));
  s().resize(390, 300);
  expect(s().view).toEqual(phone);
  // A bar under the board: the height alone changes, the scale stays and the centre follows.
  s().resize(390, 240);
  expect(s().view).toEqual({ ...phone, y: phone.y - 30 });
  s().setView({ k: 2, x: 5, y: 5 });
  s().resize(590, 500);
  expect(s().view).toEqual({ k: 2, x: 5 + (590 - 390) / 2, y: 5 + (500 - 240) / 2 });
});

test('a fitted drawing keeps every framing badge on the board, at phone and wide sizes', () => {
  // An arrow on the drawing's edge put the badge's pill partly off a phone's board.
  const words = [[1, 1, 1], [1, -2, 1, -2], [1, 1], [1, 2, 1, 2, 1, 2, 1, 2], [-1, -1, -1, -1, -1], [1, 2, 3, 1, 2, 3]];
  for (const w of words) {
    const doc = docFromDiagram(fromBraid(w));
    const points = doc.sketch.components.flatMap((c) => c.points);
    for (const [width, height] of [[390, 388], [390, 230], [812, 786]]) {
      const board = { width, height };
      const pictures = strandPictures(doc, analyse(doc.sketch), fitView(points, width, height), board);
      const [w, h] = [badgePill.width / 2, badgePill.height / 2];
      expect(pictures.every(({ badge: b }) => b!.at.x - w >= 0 && b!.at.x + w <= width && b!.at.y - h >= 0 && b!.at.y + h <= height)).toBe(true);
      // Still beside its arrow: at most the badge's offset plus a pill away.
      expect(pictures.every(({ badge: b, arrow }) => Math.hypot(b!.at.x - arrow!.at.x, b!.at.y - arrow!.at.y) <= 30 + w)).toBe(true);
    }
  }
});
