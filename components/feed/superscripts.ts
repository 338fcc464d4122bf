// A run summary's plain exponents ("t^2 q^-4", as the engine writes the Poincare polynomial)
// shown as superscripts, so a card reads as mathematics rather than as code.
const SUP: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };

export const superscripts = (text: string) => text.replace(/\^(-?\d+)/g, (_, n: string) => [...n].map((ch) => SUP[ch]).join(''));
