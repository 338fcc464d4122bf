// TeX typeset with KaTeX on web (docs/product.md "Look": real math typography). katex.css loads its
// fonts from fonts/ beside the exported CSS; `npm run build:web` copies them there.
import katex from 'katex';
import 'katex/dist/katex.min.css';
import { useMemo } from 'react';

/** `text` is what screen readers and the native sibling show; `nowrap` keeps it on one line (a card cuts it). */
export function TeX({ tex, text, display = false, nowrap = false }: { tex: string; text: string; display?: boolean; nowrap?: boolean }) {
  const html = useMemo(() => katex.renderToString(tex, { throwOnError: false, displayMode: display, output: 'htmlAndMathml' }), [tex, display]);
  return <span aria-label={text} role="math" style={nowrap ? { whiteSpace: 'nowrap' } : undefined} dangerouslySetInnerHTML={{ __html: html }} />;
}
