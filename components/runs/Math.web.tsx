// TeX typeset with KaTeX on web (DESIGN.md "Look": real math typography). The export does not
// copy the font files katex.css points to, so the fonts the tables and polynomials use are
// loaded through expo-font; the italic math face is loaded under its own name and mapped by a
// small style rule (a face registered as upright would be slanted a second time).
import katex from 'katex';
import 'katex/dist/katex.min.css';
import { loadAsync } from 'expo-font';
import { useMemo } from 'react';

void loadAsync({
  KaTeX_AMS: require('katex/dist/fonts/KaTeX_AMS-Regular.ttf'),
  KaTeX_Main: require('katex/dist/fonts/KaTeX_Main-Regular.ttf'),
  OverstrandMathItalic: require('katex/dist/fonts/KaTeX_Math-Italic.ttf'),
});
if (typeof document !== 'undefined') {
  const style = document.createElement('style');
  style.textContent = '.katex .mathnormal, .katex .mathit { font-family: OverstrandMathItalic, KaTeX_Math, serif; font-style: normal; }';
  document.head.appendChild(style);
}

/** `text` is what screen readers and the native sibling show; `nowrap` keeps it on one line (a card cuts it). */
export function TeX({ tex, text, display = false, nowrap = false }: { tex: string; text: string; display?: boolean; nowrap?: boolean }) {
  const html = useMemo(() => katex.renderToString(tex, { throwOnError: false, displayMode: display, output: 'htmlAndMathml' }), [tex, display]);
  return <span aria-label={text} role="math" style={nowrap ? { whiteSpace: 'nowrap' } : undefined} dangerouslySetInnerHTML={{ __html: html }} />;
}
