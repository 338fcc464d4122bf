// The Slate's camera under zoom gestures, checked on random views: a zoom about a point leaves the
// world point under it in place (the definition of zooming about a point, common practice), a
// pinch that does not scale is a pure pan, and a wheel turn undone by the opposite turn gives
// the view back. A fitted view follows the board's size: what it showed is scaled to fit the new
// board about its centre (so it stays in view and fills one side), and the reverse resize gives
// the fit back; once zoomed by hand, a resize only keeps the centre.
import { seededRng } from '@/shared/knot/moves/random';
import { toWorld } from '@/lib/slate/picture';
import { useSlate } from '@/lib/slate/slate-store';
import { pinchedView, resizedView, wheelView, zoomAbout } from '@/lib/slate/zoom';

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

test('a fitted view on a resized board shows what it showed, scaled to fit about the centre', () => {
  for (let i = 0; i < 200; i++) {
    const base = { view: randomView(), size: randomSize() };
    const { width, height } = randomSize();
    const v = resizedView(base, width, height);
    const [a, b] = [toWorld(base.view, { x: 0, y: 0 }), toWorld(base.view, { x: base.size.width, y: base.size.height })];
    const [c, d] = [toWorld(v, { x: 0, y: 0 }), toWorld(v, { x: width, y: height })];
    // The old board's world box lies within the new one, with the same centre and one side shared.
    expect(c.x).toBeLessThanOrEqual(a.x + 1e-6);
    expect(c.y).toBeLessThanOrEqual(a.y + 1e-6);
    expect(d.x).toBeGreaterThanOrEqual(b.x - 1e-6);
    expect(d.y).toBeGreaterThanOrEqual(b.y - 1e-6);
    expect((c.x + d.x) / 2).toBeCloseTo((a.x + b.x) / 2, 6);
    expect((c.y + d.y) / 2).toBeCloseTo((a.y + b.y) / 2, 6);
    expect(Math.min(Math.abs(c.x - a.x), Math.abs(c.y - a.y))).toBeCloseTo(0, 6);
  }
});

test('the Slate: a resize and its reverse give the fit back; after a hand zoom a resize keeps the centre', () => {
  const s = () => useSlate.getState();
  s().resize(390, 300);
  s().markFitted(s().fitRequest, { k: 0.4, x: 20, y: -10 });
  s().resize(1440, 900);
  expect(s().view.k).toBeCloseTo(0.4 * Math.min(1440 / 390, 900 / 300), 9);
  s().resize(390, 300);
  expect(s().view).toEqual({ k: 0.4, x: 20, y: -10 });
  s().setView({ k: 2, x: 5, y: 5 });
  s().resize(590, 500);
  expect(s().view).toEqual({ k: 2, x: 105, y: 105 });
});
