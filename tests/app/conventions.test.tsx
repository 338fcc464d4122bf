// The line under a knot's name: which mirror image the table's entry is, told by the signature;
// the Conventions sheet writes names as the Readout does.
import { render, screen } from '@testing-library/react-native';
import { ConventionsSheet, chiralityNote } from '@/components/readout/Conventions';

test('the table\'s 3_1 is the positive trefoil, signature -2, whichever image is drawn', () => {
  // The positive trefoil has signature -2 and the table's 3_1 is it (docs/conventions.md,
  // Signature; Names of knots); its mirror has +2 (the signature changes sign under mirroring,
  // Lickorish, An Introduction to Knot Theory, ch. 6).
  expect(chiralityNote('3_1', false, -2)).toBe("Our table's 3_1 is the positive (right-handed) trefoil, with signature −2. Positive knots have negative signature here.");
  expect(chiralityNote('3_1', true, 2)).toBe("Our table's 3_1 is the positive (right-handed) trefoil, with signature −2; this diagram is its mirror. Positive knots have negative signature here.");
});

test('other entries name their signature; signature 0 cannot tell mirror images apart', () => {
  // 5_1 = T(2,5) as a positive knot has signature -4 (docs/conventions.md sign; from memory).
  expect(chiralityNote('5_1', true, 4)).toContain("Our table's 5_1 has signature −4; this diagram is its mirror.");
  // The figure-eight knot is amphichiral with signature 0 (Rolfsen, Knots and Links, from memory).
  expect(chiralityNote('4_1', false, 0)).toBeNull();
});

test('the sheet typesets the names it mentions, as the Readout\'s name line does', () => {
  render(<ConventionsSheet visible onClose={() => {}} />);
  // 3_1 is the positive trefoil in our table (docs/conventions.md, Names).
  const names = screen.getByLabelText(/3₁ is the positive trefoil/);
  expect(names).toHaveTextContent(/3₁ is the positive trefoil; the other one reads "3₁ \(mirror\)"/);
  expect(names).not.toHaveTextContent(/3_1/);
});
