// Shared sketches are pictured as the Slate draws them and keep their framed-link data: two
// drawings of the same two circles, one with a crossing flipped (a Hopf link) and one not (an
// unlink), shared by Ada; Bruno's feed and Ada's sketchbook draw each strand cut where it passes
// under (a pixel check at both crossings), and the shared page shows Bruno the framing Ada gave
// (-1), the component numbers and the linking number. A comment with $TeX$ is typeset.
import { randomUUID } from 'node:crypto';
import type { Browser, Locator, Page } from 'playwright-core';
import { analyse } from '@/shared/drawing/analyse';
import type { Sketch } from '@/shared/drawing/sketch';
import { linkingMatrix } from '@/shared/knot/linking';
import { call, groupOfTwo, person, shoot, signedInPair } from './helpers';

const ada = person('Ada Framewright', 'ada.frames', 'framed links travel 5');
const bruno = person('Bruno Reader', 'bruno.frames', 'gaps at crossings 6');
const LINKED = 'Hopf link, -1 on the first circle';
const UNLINKED = 'Two circles, one lying on the other';
/** Long enough to need two lines on a phone: the group chip wraps instead of cutting it. */
const GROUP = 'Framed links and Kirby calculus reading seminar, winter';

let browser: Browser;
let adaPage: Page;
let brunoPage: Page;

// Two circles of radius 50 about (100, 100) and (160, 100) (screen coordinates, y down) meet at
// (130, 60) and (130, 140). Drawn first, circle a passes over at both (the Slate's default);
// a flip at the top crossing puts b over there, which links them.
const R = 50;
const circle = (cx: number) => Array.from({ length: 104 }, (_, i) => ({ x: cx + R * Math.cos((i / 104) * 2 * Math.PI), y: 100 + R * Math.sin((i / 104) * 2 * Math.PI) }));
const drawing = (flipped: boolean): Sketch => ({
  components: [
    { id: 'a', seq: 1, points: circle(100), closed: true, reversed: false, framing: -1 },
    { id: 'b', seq: 2, points: circle(160), closed: true, reversed: false, framing: null },
  ],
  flips: flipped ? [{ a: 'a', b: 'b', at: { x: 130, y: 60 } }] : [],
  nextSeq: 3,
});

/** The stored diagram as the Slate writes it (lib/slate/record.ts): code and framings read from the drawing. */
function stored(sketch: Sketch) {
  const d = analyse(sketch).diagram!;
  return {
    diagram: { pd: d.diagram.pd.map((x) => [...x]), unknots: d.diagram.unknots, framings: [...d.diagram.framings], strokes: [], geometry: { ...sketch, colours: {} } },
    order: d.componentIds,
    lk: linkingMatrix(d.diagram)[0][1],
  };
}
const linked = stored(drawing(true));
const unlinked = stored(drawing(false));

/** Unit tangents at the crossings (perpendicular to the radius there): a's and b's. */
const crossings = [
  { name: 'top', dy: -40, a: { x: 0.8, y: 0.6 }, b: { x: 0.8, y: -0.6 } },
  { name: 'bottom', dy: 40, a: { x: 0.8, y: -0.6 }, b: { x: 0.8, y: 0.6 } },
];

/** The picture's pixels (RGBA), drawn from its own SVG onto a canvas in the page. */
async function pixels(picture: Locator) {
  return picture.evaluate(async (box) => {
    const svg = box.querySelector('svg')!;
    const [w, h] = [Number(svg.getAttribute('width')), Number(svg.getAttribute('height'))];
    const img = new Image();
    img.src = 'data:image/svg+xml;charset=utf-8,' + encodeURIComponent(new XMLSerializer().serializeToString(svg));
    await img.decode();
    const canvas = document.createElement('canvas');
    [canvas.width, canvas.height] = [w, h];
    const ctx = canvas.getContext('2d')!;
    ctx.drawImage(img, 0, 0);
    return { w, h, data: Array.from(ctx.getImageData(0, 0, w, h).data) };
  });
}

/**
 * Which circle is cut at each crossing. The drawing spans 160 x 100 world units centred on the
 * crossings' x, so the painted pixels' bounding box gives the scale; 4 px along the under
 * strand lies inside its gap (8 px either side, lib/slate/picture.ts), 3 px along the over
 * strand lies on it.
 */
async function underAt(picture: Locator): Promise<string[]> {
  const { w, h, data } = await pixels(picture);
  const alpha = (x: number, y: number) => data[(Math.round(y) * w + Math.round(x)) * 4 + 3];
  const painted: [number, number][] = [];
  for (let y = 0; y < h; y++) for (let x = 0; x < w; x++) if (alpha(x, y) > 100) painted.push([x, y]);
  const xs = painted.map((p) => p[0]);
  const ys = painted.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const k = (x1 - x0) / 160;
  const [cx, cy] = [(x0 + x1) / 2, (y0 + y1) / 2];
  return crossings.map((c) => {
    const at = { x: cx, y: cy + c.dy * k };
    const along = (t: { x: number; y: number }, d: number) => Math.min(alpha(at.x + t.x * d, at.y + t.y * d), alpha(at.x - t.x * d, at.y - t.y * d));
    const cut = (['a', 'b'] as const).filter((s) => along(c[s], 4) < 60);
    const whole = (['a', 'b'] as const).filter((s) => along(c[s], 3) > 120);
    expect(alpha(at.x, at.y)).toBeGreaterThan(120); // the over strand passes through the crossing
    expect(cut).toHaveLength(1);
    expect(whole).toEqual((['a', 'b'] as const).filter((s) => s !== cut[0]));
    return `${c.name}: ${cut[0]} under`;
  });
}

beforeAll(async () => {
  const { ownerToken, groupId } = await groupOfTwo(ada, bruno, GROUP);
  const now = new Date().toISOString();
  let clock = 0;
  for (const [title, s] of [[UNLINKED, unlinked], [LINKED, linked]] as const) {
    await call('POST', '/api/sync/push', ownerToken, {
      deviceId: 'ada-phone',
      mutations: [{
        mutationId: randomUUID(), deviceId: 'ada-phone', clock: ++clock, recordId: randomUUID(), type: 'sketch', op: 'add', baseVersion: 0,
        fields: { title, seenAt: '', notes: '', tags: [], attachments: [], groupId, deleted: false, createdAt: now, updatedAt: now, diagram: s.diagram },
      }],
    });
  }
  ({ browser, phone: { page: brunoPage }, wide: { page: adaPage } } = await signedInPair(bruno, ada, 15_000));
});

afterAll(async () => {
  await browser?.close();
});

test('the feed draws gaps where a strand passes under: the flipped crossing shows it', async () => {
  await brunoPage.getByRole('tab', { name: 'Feed' }).click();
  const picture = (title: string) => brunoPage.getByRole('img', { name: `Picture of ${title}` });
  await picture(LINKED).waitFor();
  const chip = brunoPage.getByRole('button', { name: GROUP });
  expect(await chip.innerText()).toBe(GROUP); // all of it, not cut
  expect((await chip.boundingBox())!.height).toBeGreaterThanOrEqual(44);
  expect(await underAt(picture(UNLINKED))).toEqual(['top: b under', 'bottom: b under']);
  expect(await underAt(picture(LINKED))).toEqual(['top: a under', 'bottom: b under']);
  await shoot(brunoPage, 'feed-pictures-01-feed');
});

test('the sketchbook draws them the same way', async () => {
  const picture = (title: string) => adaPage.getByRole('img', { name: `Picture of ${title}` });
  await picture(LINKED).waitFor({ timeout: 20_000 }); // pulled onto Ada's device
  expect(await underAt(picture(UNLINKED))).toEqual(['top: b under', 'bottom: b under']);
  expect(await underAt(picture(LINKED))).toEqual(['top: a under', 'bottom: b under']);
  await shoot(adaPage, 'feed-pictures-02-sketchbook');
});

test('the shared page shows Bruno the framing, the component numbers and the linking number', async () => {
  await brunoPage.getByRole('link', { name: `Open ${LINKED}` }).click();
  await brunoPage.getByRole('heading', { name: LINKED }).waitFor();
  const framed = brunoPage.getByTestId('framed-link');
  // Numbered in drawing order, as on the Slate and the picture (a was drawn first); circle a
  // carries framing -1, b the blackboard framing, which is 0 without self-crossings
  // (docs/conventions.md, Framings and cables).
  const [na, nb] = [1, 2];
  expect(linked.order).toEqual(['b', 'a']); // the code lists b first: the numbers are not its order
  await framed.getByText(`Framings: ${na}: −1   ${nb}: 0 bb`).waitFor();
  // The Hopf link has linking number ±1 (Rolfsen, Knots and Links, ch. 5D, from memory); the
  // sign is half the sum of the crossing signs (docs/conventions.md).
  expect(Math.abs(linked.lk)).toBe(1);
  await framed.getByText(`Linking numbers: lk(1,2) = ${linked.lk > 0 ? '+1' : '−1'}`).waitFor();
  const label = await brunoPage.getByRole('img', { name: `Picture of ${LINKED}` }).evaluate((e) => e.textContent ?? '');
  expect(label).toContain(`${na}: −1`); // the picture's own label, as on the Slate's badge and the framings line
  expect(label).toContain(`${nb}: bb`);
  // On the 390 px phone the picture fills the page's column (the screen less its padding), not a fixed 300 px.
  const column = (await brunoPage.getByTestId('shared-picture').boundingBox())!.width;
  const picture = (await brunoPage.getByRole('img', { name: `Picture of ${LINKED}` }).boundingBox())!.width;
  expect(column).toBeGreaterThan(330);
  expect(picture).toBeGreaterThan(column - 10);
  expect(picture).toBeLessThanOrEqual(column);
  await shoot(brunoPage, 'feed-pictures-03-shared-page');
});

test('a comment with $TeX$ is typeset', async () => {
  await brunoPage.getByRole('textbox', { name: 'Comment', exact: true }).fill('So $\\mathrm{lk}(K_1, K_2) = \\pm 1$ here.');
  await brunoPage.getByRole('button', { name: 'Post comment' }).click();
  const math = brunoPage.getByRole('math', { name: '\\mathrm{lk}(K_1, K_2) = \\pm 1' });
  await math.waitFor();
  expect(await math.locator('.katex').count()).toBeGreaterThan(0); // typeset by KaTeX, not the raw text
  expect(await brunoPage.getByText('$\\mathrm', { exact: false }).count()).toBe(0);
  await shoot(brunoPage, 'feed-pictures-04-tex-comment');
});
