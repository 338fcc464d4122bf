// Integers as the app prints them: negative ones with the true minus sign (U+2212), as the
// polynomials print theirs, never a hyphen.

export const minus = (n: number): string => (n < 0 ? `−${-n}` : `${n}`);

/** With its sign always (+2, −1, 0): framings, linking numbers, writhe. */
export const signed = (n: number): string => (n > 0 ? `+${n}` : minus(n));

/** The digits of `s` as Unicode subscripts (x₁₂, 𝔽₅), the plain-text stand-in for TeX's `_{12}`. */
export const subscript = (s: string): string => s.replace(/\d/g, (d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]);
