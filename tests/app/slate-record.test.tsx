// Between the Slate and the stored record: a drawing saved and reopened is the same drawing
// (same diagram, colours, flips); a record with only a PD code (typed elsewhere) is laid out
// into a drawing whose PD code reads back with the same invariants.
import { analyse } from '@/shared/drawing/analyse';
import { flipCrossing } from '@/shared/drawing/sketch';
import { fromBraid } from '@/shared/knot/braid';
import { jones } from '@/shared/knot/jones';
import { linkingMatrix } from '@/shared/knot/linking';
import { docFromDiagram, docFromStored, toStoredDiagram } from '@/lib/slate/record';

// The closure of sigma1 sigma2^-1 sigma1 sigma2^-1 is the figure-eight knot (from memory).
const figureEight = fromBraid([1, -2, 1, -2]);

test('a drawing saved and reopened is the same drawing', () => {
  const laid = docFromDiagram(figureEight);
  const a = analyse(laid.sketch);
  const c = a.crossings[0];
  const edited = { sketch: flipCrossing(laid.sketch, { a: c.over, b: c.under, at: c.at }), colours: { [laid.sketch.components[0].id]: 3 } };
  const stored = toStoredDiagram(edited, analyse(edited.sketch));
  const reopened = docFromStored(JSON.parse(JSON.stringify(stored)));
  expect(reopened).toEqual(edited);
  expect(analyse(reopened.sketch).diagram!.diagram.pd).toEqual(stored.pd);
  expect(stored.strokes).toHaveLength(1);
  expect(stored.strokes[0].closed).toBe(true);
});

test('a record with only a PD code is laid out with the same invariants and framings', () => {
  // A Hopf link with framings 1 and -2 (the closure of sigma1^2; linking number 1, Rolfsen 5.D);
  // the linking matrix carries the framings on its diagonal.
  const hopf = { ...fromBraid([1, 1]), framings: [1, -2] };
  const doc = docFromStored({ pd: hopf.pd.map((x) => [...x] as [number, number, number, number]), unknots: 0, framings: [1, -2], strokes: [] });
  const back = analyse(doc.sketch).diagram!.diagram;
  expect(back.pd).toHaveLength(2);
  expect(jones(back).equals(jones(hopf))).toBe(true);
  expect(linkingMatrix(back)).toEqual(linkingMatrix(hopf));
});

test('an empty record is an empty drawing', () => {
  expect(docFromStored({ pd: [], unknots: 0, framings: [], strokes: [] }).sketch.components).toHaveLength(0);
});
