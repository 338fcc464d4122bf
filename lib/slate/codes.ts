// Text codes onto the Slate: a pasted PD code, DT code or braid word becomes a diagram, or a
// message that says what is wrong. Accepts PD codes as JSON ([[1,5,2,4],...]) or as a list
// of X[a,b,c,d]; braid words and DT codes as integers separated by spaces or commas.
import type { Sketch } from '@/shared/drawing/sketch';
import { diagram, type Diagram } from '@/shared/knot/diagram';
import { fromBraid, parseBraid } from '@/shared/knot/braid';
import { fromDT, MAX_DT_CROSSINGS, parseDT } from '@/shared/knot/dt';
import { parsePD } from '@/shared/knot/pd';

export type CodeKind = 'pd' | 'dt' | 'braid';

export const codeKinds: readonly { kind: CodeKind; label: string; example: string }[] = [
  { kind: 'pd', label: 'PD code', example: '[[1,5,2,4],[3,1,4,6],[5,3,6,2]]' },
  { kind: 'dt', label: 'DT code', example: '4 6 2' },
  { kind: 'braid', label: 'Braid word', example: '1 1 1' },
];

/** `sketch`: the diagram's standard picture, already checked to read back as it (shared/layout). */
export type Parsed = { ok: true; diagram: Diagram; braid?: number[]; sketch?: Sketch | null } | { ok: false; error: string };

/** "X[1,5,2,4] X[3,1,4,6]" (a list of X[...]) is rewritten as JSON; JSON passes unchanged. */
function pdJson(text: string): string {
  const t = text.trim();
  if (!/X\s*\[/i.test(t)) return t;
  const crossings = [...t.matchAll(/X\s*\[([^\]]*)\]/gi)].map((m) => `[${m[1]}]`);
  return `[${crossings.join(',')}]`;
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** "[1, -2, 1]" or "(4 6 2)" read as the list inside. */
const unbracket = (text: string) => text.trim().replace(/^[[(]([^]*)[\])]$/, '$1');

export function parseCode(kind: CodeKind, text: string): Parsed {
  if (text.trim() === '') return { ok: false, error: 'Paste or type a code first.' };
  try {
    if (kind === 'pd') return { ok: true, diagram: diagram(parsePD(pdJson(text))) };
    if (kind === 'dt') {
      const code = parseDT(unbracket(text));
      if (code.length > MAX_DT_CROSSINGS) return { ok: false, error: `DT codes of up to ${MAX_DT_CROSSINGS} crossings are read; this one has ${code.length}.` };
      return { ok: true, diagram: fromDT(code) };
    }
    const word = parseBraid(unbracket(text));
    return { ok: true, diagram: fromBraid(word), braid: word };
  } catch (e) {
    return { ok: false, error: capital(e instanceof Error ? e.message : String(e)) + '.' };
  }
}

const sourceWords: Record<CodeKind, string> = { pd: 'PD', dt: 'DT', braid: 'braid' };

/** A code as a run keeps it ("braid 1 -2 1"): the kind's word, then the text on one line; parseSource reads it back. */
export const sourceOf = (kind: CodeKind, text: string): string => `${sourceWords[kind]} ${text.trim().replace(/\s+/g, ' ')}`;

export function parseSource(source: string): Parsed {
  const [word, ...rest] = source.trim().split(' ');
  const kind = (Object.keys(sourceWords) as CodeKind[]).find((k) => sourceWords[k] === word);
  return kind ? parseCode(kind, rest.join(' ')) : { ok: false, error: `Not a code of a known kind: "${word}".` };
}
