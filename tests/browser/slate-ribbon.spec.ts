// A nontrivial ribbon knot on the Slate with a finger at 390x844: the square knot (the right
// trefoil summed with its mirror) pasted as a PD code, one band drawn by touch across it, and the
// Readout certifies a ribbon disk (one band to the 2-component unlink: c = b + 1,
// shared/knot/bands/certificate.ts) whose class in Kh(K; F2) is nonzero at (h, q) = (0, chi) =
// (0, 1). A second sketch of the same code with another ribbon band is compared with the first.
// The bands' places were found by trying straight chords of the layout the Slate draws for
// this code (shared/layout) with the band mathematics, keeping those that stay ribbon when their
// ends move by 1.5 units (touch points are whole pixels); the spec checks them again in Node
// first, and the browser must then say what the mathematics says.
import type { Browser, CDPSession, Page } from 'playwright-core';
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { certifyBands } from '@/components/readout/local-bands';
import { compareSketches } from '@/components/readout/local-compare';
import { readBands } from '@/shared/drawing/band-read';
import type { Point } from '@/shared/drawing/point';
import type { Sketch } from '@/shared/drawing/sketch';
import { jones } from '@/shared/knot/jones';
import { layoutPD, layoutToSketch } from '@/shared/layout';
import { drawBand, moreReadout, withBand } from './bands-touch';
import { baseUrl, newTitledSketch, person, phoneWithTouch, shoot } from './helpers';

const who = person('Rhea Ribbon', 'rhea.ribbon', 'ribbon and disk 5');

// The square knot: the right trefoil [[1,5,2,4],[3,1,4,6],[5,3,6,2]] summed with its mirror
// (PD codes from memory; the sum made by shared/knot/families/sum.ts). Its Jones polynomial is
// the product of the trefoils', -t^3 + t^2 - t + 3 - t^-1 + t^-2 - t^-3 (Jones 1985: V is
// multiplicative under connected sum), so it is not the unknot.
const PD = [[1, 5, 2, 4], [3, 7, 4, 6], [5, 3, 6, 2], [7, 10, 8, 11], [9, 12, 10, 1], [11, 8, 12, 9]] as [number, number, number, number][];
const squareJones = '-t^-3 + t^-2 - t^-1 + 3 - t + t^2 - t^3';
// Two ribbon bands (world coordinates of the layout), each crossing one strand, passing over it.
const bandA: [Point, Point] = [{ x: 120.44, y: 63.22 }, { x: 48.78, y: 3.17 }];
const bandB: [Point, Point] = [{ x: 141.21, y: 43.45 }, { x: 56.55, y: -25.32 }];

const strands: Sketch = layoutToSketch(layoutPD(PD, 0), []);
let browser: Browser;
let page: Page;
let touch: CDPSession;

beforeAll(async () => {
  ({ browser, page, touch } = await phoneWithTouch(who, 30_000));
});

afterAll(async () => {
  await browser?.close();
});

test('in Node: the layout is the square knot, and both bands are ribbon disks', () => {
  expect(jones({ pd: PD, unknots: 0, framings: [] }).toString()).toBe(squareJones);
  for (const b of [bandA, bandB]) {
    const r = readBands(withBand(strands, b));
    if (!r || 'reason' in r) throw new Error(r ? r.reason : 'no bands');
    const c = certifyBands({ ...r.presentation, saddles: [...r.presentation.saddles] });
    expect(c).toMatchObject({ components: 2, bands: 1, ribbon: true, surface: { value: { q: 1, zero: false } } });
  }
});

async function drawSquareKnotWithBand(title: string, band: [Point, Point]): Promise<void> {
  await page.goto(baseUrl + '/sketches');
  await newTitledSketch(page, title);
  await page.getByRole('button', { name: 'Paste a code' }).click();
  await page.getByRole('textbox', { name: 'PD code' }).fill(JSON.stringify(PD));
  await page.getByRole('button', { name: 'Draw it' }).click();
  await page.getByTestId('readout-crossings-count').getByText('6 crossings').waitFor();
  await drawBand(page, touch, strands, band);
  await page.getByTestId('readout-bands-ribbon').getByText('Ribbon disk: the knot is ribbon, hence slice').waitFor();
  await page.getByText('1 band → 2-component unlink', { exact: false }).waitFor();
  // The field is typeset (KaTeX), its plain name the math element's label.
  await page.getByTestId('readout-bands-class').getByText(/^Class over .*: nonzero at \(h, q\) = \(0, 1\)$/).waitFor();
  await page.getByTestId('readout-bands-class').getByRole('math', { name: '𝔽₂' }).waitFor();
}

const keep = (name: string) => {
  mkdirSync('/tmp/bandsui-shots', { recursive: true });
  for (const size of ['390x844', '1440x900']) copyFileSync(join(__dirname, '../artifacts', `${name}-${size}.png`), `/tmp/bandsui-shots/${name}-${size}.png`);
};

test('the square knot with a band drawn by touch: ribbon, its class nonzero at q = chi = 1', async () => {
  await drawSquareKnotWithBand('Square knot, disk A', bandA);
  await moreReadout(page);
  await shoot(page, 'slate-ribbon-class', () => page.getByTestId('readout-bands-class').scrollIntoViewIfNeeded());
  keep('slate-ribbon-class');
});

test('another band on the same strands, compared with the first sketch', async () => {
  await drawSquareKnotWithBand('Square knot, disk B', bandB);
  const expected = compareSketches({ a: withBand(strands, bandB), b: withBand(strands, bandA) });
  if (expected.kind !== 'compared') throw new Error(`no comparison in Node: ${JSON.stringify(expected)}`);
  await page.getByRole('button', { name: 'Compare with…' }).click();
  await page.getByRole('button', { name: 'Compare with Square knot, disk A' }).click();
  const verdict = expected.verdict === 'differ' ? 'Their classes differ: the surfaces are not isotopic rel boundary.' : 'Equal classes (no conclusion).';
  await page.getByTestId('readout-bands-verdict').getByText(verdict).waitFor();
  await moreReadout(page);
  // At both sizes the other sketch's title stays beside the button, wrapping there if it must.
  const besideButton = async () => {
    const compare = page.getByTestId('readout-bands-compare');
    const [button, title] = [await compare.getByRole('button', { name: 'Compare with…' }).boundingBox(), await compare.getByText('with “Square knot, disk A”').boundingBox()];
    expect(title!.x).toBeGreaterThan(button!.x + button!.width);
    expect(title!.y).toBeLessThan(button!.y + button!.height);
  };
  await shoot(page, 'slate-ribbon-compare', async () => {
    await page.getByTestId('readout-bands-verdict').scrollIntoViewIfNeeded();
    await besideButton();
  });
  keep('slate-ribbon-compare');
});
