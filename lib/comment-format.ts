// The simple formatting of comments: **bold**, *italic*, `code`; everything else is plain text,
// line breaks kept. The result is spans the app renders as <Text> nodes, so markup typed into
// a comment (even <script>) can only ever show as characters, never run.

export interface Span {
  text: string;
  bold?: boolean;
  italic?: boolean;
  code?: boolean;
}

// Markers hug their text (no space just inside), as in Markdown, so "2 * 3 * 4" stays arithmetic.
const TOKEN = /(\*\*(?=\S)[^*\n]+?(?<=\S)\*\*|\*(?=\S)[^*\n]+?(?<=\S)\*|`[^`\n]+`)/g;

/** Unclosed markers stay literal: "2*3" or "**not closed" read as typed. */
export function formatComment(body: string): Span[] {
  const out: Span[] = [];
  for (const part of body.split(TOKEN)) {
    if (!part) continue;
    if (part.length > 4 && part.startsWith('**') && part.endsWith('**')) out.push({ text: part.slice(2, -2), bold: true });
    else if (part.length > 2 && part.startsWith('`') && part.endsWith('`')) out.push({ text: part.slice(1, -1), code: true });
    else if (part.length > 2 && part.startsWith('*') && part.endsWith('*')) out.push({ text: part.slice(1, -1), italic: true });
    else out.push({ text: part });
  }
  return out;
}
