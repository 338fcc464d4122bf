// Codes written as text, one way each, everywhere (the Slate's copy buttons, the run form and
// run page, exports, e-mails): a PD code as JSON, the form parsePD (and the command line) reads
// back; a braid word as its letters separated by spaces, the form parseBraid reads back.
import type { PDCode } from '../knot/pd';

export const pdToText = (pd: PDCode): string => JSON.stringify(pd);

export const braidToText = (word: readonly number[]): string => word.join(' ');
