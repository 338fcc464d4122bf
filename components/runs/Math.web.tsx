// TeX typeset with KaTeX on web (DESIGN.md "Look": real math typography).
import katex from 'katex';
import 'katex/dist/katex.min.css';
import { useMemo } from 'react';

/** `text` is what screen readers and the native sibling show. */
export function TeX({ tex, text, display = false }: { tex: string; text: string; display?: boolean }) {
  const html = useMemo(() => katex.renderToString(tex, { throwOnError: false, displayMode: display, output: 'htmlAndMathml' }), [tex, display]);
  return <span aria-label={text} role="math" dangerouslySetInnerHTML={{ __html: html }} />;
}
