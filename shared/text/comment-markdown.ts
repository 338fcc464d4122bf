// Comment text: Markdown by markdown-it (CommonMark, raw HTML off, links only to http(s) and
// mailto) with inline maths between dollars. The result is plain data (blocks of spans), so the
// app renders it as text nodes and the e-mail as its own HTML: nothing typed can become markup.
// Dollars follow pandoc's tex_math_dollars rule: no space just inside the dollars and no digit
// right after the closing one, so "$5 and $6" stays money; "\$" is a literal dollar.
import MarkdownIt, { type MarkdownIt as Parser, type StateInline, type Token } from 'markdown-it';

export type Span =
  | { kind: 'text'; text: string; bold?: boolean; italic?: boolean; code?: boolean; href?: string }
  | { kind: 'math'; tex: string }
  | { kind: 'break' };

/** A paragraph, heading, quote line, list item (with its marker, "•" or "3.") or code block. */
export interface Block {
  kind: 'paragraph' | 'heading' | 'quote' | 'item' | 'code';
  spans: Span[];
  marker?: string;
  depth?: number;
}

function mathDollars(state: StateInline, silent: boolean): boolean {
  const { src, pos } = state;
  if (src[pos] !== '$' || src[pos + 1] === '$' || /\s/.test(src[pos + 1] ?? ' ')) return false;
  let end = pos + 1;
  for (;;) {
    end = src.indexOf('$', end);
    if (end < 0) return false;
    if (src[end - 1] !== '\\' && !/\s/.test(src[end - 1]) && !/[0-9]/.test(src[end + 1] ?? '')) break;
    end += 1;
  }
  if (!silent) state.push('math_inline', 'math', 0).content = src.slice(pos + 1, end);
  state.pos = end + 1;
  return true;
}

/** A fresh parser (callers may set their own renderer rules, as the e-mail does for maths). */
export function commentMarkdown(): Parser {
  const md = new MarkdownIt('commonmark', { html: false, linkify: false, breaks: true });
  md.inline.ruler.after('escape', 'math_dollars', mathDollars);
  md.validateLink = (url) => /^(https?:|mailto:)/i.test(url.trim());
  return md;
}

const parser = commentMarkdown();

function spansOf(children: Token[]): Span[] {
  const out: Span[] = [];
  let bold = 0;
  let italic = 0;
  let href: string | undefined;
  const text = (t: string, code = false) => {
    if (t) out.push({ kind: 'text', text: t, ...(bold > 0 && { bold: true }), ...(italic > 0 && { italic: true }), ...(code && { code: true }), ...(href && { href }) });
  };
  for (const t of children) {
    switch (t.type) {
      case 'text': text(t.content); break;
      case 'code_inline': text(t.content, true); break;
      case 'math_inline': out.push({ kind: 'math', tex: t.content }); break;
      case 'softbreak': case 'hardbreak': out.push({ kind: 'break' }); break;
      case 'strong_open': bold++; break;
      case 'strong_close': bold--; break;
      case 'em_open': italic++; break;
      case 'em_close': italic--; break;
      case 'link_open': href = String(t.attrGet('href') ?? '') || undefined; break;
      case 'link_close': href = undefined; break;
      // Images (no HTML, no remote loads from a comment): their alt text.
      case 'image': text(t.content); break;
      default: text(t.content);
    }
  }
  return out;
}

/** The comment as blocks of spans, in reading order. */
export function commentBlocks(body: string): Block[] {
  const blocks: Block[] = [];
  const lists: { ordered: boolean; next: number }[] = [];
  let kind: Block['kind'] = 'paragraph';
  let marker: string | undefined;
  for (const t of parser.parse(body, {})) {
    switch (t.type) {
      case 'bullet_list_open': lists.push({ ordered: false, next: 1 }); break;
      case 'ordered_list_open': lists.push({ ordered: true, next: Number(t.attrGet('start') ?? 1) }); break;
      case 'bullet_list_close': case 'ordered_list_close': lists.pop(); break;
      case 'list_item_open': {
        const l = lists[lists.length - 1];
        marker = l.ordered ? `${l.next++}.` : '•';
        break;
      }
      case 'heading_open': kind = 'heading'; break;
      case 'blockquote_open': kind = 'quote'; break;
      case 'blockquote_close': case 'heading_close': kind = 'paragraph'; break;
      case 'fence': case 'code_block':
        blocks.push({ kind: 'code', spans: [{ kind: 'text', text: t.content.replace(/\n$/, ''), code: true }] });
        break;
      case 'inline': {
        const spans = spansOf(t.children ?? []);
        if (marker) blocks.push({ kind: 'item', spans, marker, depth: lists.length });
        else blocks.push({ kind: lists.length ? 'item' : kind, spans, ...(lists.length && { depth: lists.length }) });
        marker = undefined;
        break;
      }
    }
  }
  return blocks;
}

/** Words a person reads, markers gone, maths as its TeX (notification lists, e-mail text). */
export const commentPlainText = (body: string): string =>
  commentBlocks(body)
    .map((b) => (b.marker ? `${b.marker} ` : '') + b.spans.map((s) => (s.kind === 'text' ? s.text : s.kind === 'math' ? s.tex : '\n')).join(''))
    .join('\n');
