// Codes written as text, one way each, everywhere (the Slate's copy buttons, the run form and
// run page, exports, e-mails): a PD code as JSON with a space between crossings (so a long
// one wraps between them), the form parsePD (and the command line) reads back; a braid word as
// its letters separated by spaces, the form parseBraid reads back.
import type { PDCode } from '../knot/pd';

export const pdToText = (pd: PDCode): string => `[${pd.map((x) => `[${x.join(',')}]`).join(', ')}]`;

export const braidToText = (word: readonly number[]): string => word.join(' ');
