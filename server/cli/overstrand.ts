// The `overstrand` command line (the contract in DEVELOPERS.md, Command line): `invariants` for one diagram, `batch` for
// JSON lines on stdin (streamed: one answer per line as it arrives), `kh` for a Khovanov table.
// All mathematics lives in shared/; this file only reads, validates and prints.
import { Command, Option } from 'commander';
import { createInterface } from 'node:readline';
import { Laurent } from '@/shared/knot';
import { parseBraid } from '@/shared/knot/braid';
import { parseDT } from '@/shared/knot/dt';
import { parsePD } from '@/shared/knot/pd';
import { grid, groupText } from '@/shared/khovanov/format';
import { answer, Answer, answerLine, describeIssues, Request } from './requests';

interface CodeOptions {
  pd?: string;
  braid?: string;
  dt?: string;
  unknots?: string;
}

// The diagram options shared by `invariants` and `kh`, turned into a validated request.
function requestFrom(o: CodeOptions, extra: Record<string, unknown>): Request {
  const given = [o.pd, o.braid, o.dt].filter((x) => x !== undefined).length;
  if (given !== 1) throw new Error('give exactly one of --pd, --braid or --dt');
  const code = o.pd !== undefined ? { pd: parsePD(o.pd) } : o.braid !== undefined ? { braid: parseBraid(o.braid) } : { dt: parseDT(o.dt!) };
  const unknots = o.unknots === undefined ? {} : { unknots: Number(o.unknots) };
  const parsed = Request.safeParse({ ...code, ...unknots, ...extra });
  if (!parsed.success) throw new Error(describeIssues(parsed.error));
  return parsed.data;
}

const poly = (pairs: unknown, variable: string) => Laurent.fromJSON(pairs as [number, number | string][]).format(variable);

function summary(a: Answer): string {
  const rows: [string, string][] = [
    ['crossings', String(a.crossings)],
    ['components', String(a.components)],
    ['writhe', String(a.writhe)],
    ['Kauffman bracket', poly(a.bracket, 'A')],
    ['Jones polynomial', poly(a.jones, 't')],
    ['Alexander polynomial', poly(a.alexander, 't') + (a.alexanderSign === 'conway' ? '' : '  (up to sign)')],
    ['determinant', String(a.determinant)],
    ['signature', String(a.signature)],
    ['linking matrix', (a.linking as number[][]).map((row) => row.join(' ')).join(' | ')],
  ];
  const c = a.colourings as { n: number; count: number | string };
  rows.push([`Fox ${c.n}-colourings`, String(c.count)]);
  rows.push(['name', (a.name as string | null) ?? 'no match in the table (prime knots up to 8 crossings)']);
  const width = Math.max(...rows.map(([k]) => k.length));
  return rows.map(([k, v]) => `${k.padEnd(width)}  ${v}`).join('\n');
}

function khTable(a: Answer): string {
  const kh = a.kh as { ring: string; reduced: boolean; groups: { i: number; j: number; free: number; torsion: number[] }[] };
  const g = grid(kh.groups);
  const title = `${kh.reduced ? 'reduced ' : ''}Khovanov homology over ${kh.ring} (i across, j down)`;
  if (g.is.length === 0) return `${title}\n(zero)`;
  const cells = [['j \\ i', ...g.is.map(String)], ...g.js.map((j) => [String(j), ...g.is.map((i) => (g.at(i, j) ? groupText(g.at(i, j)!, kh.ring) : '.'))])];
  const widths = cells[0].map((_, col) => Math.max(...cells.map((row) => row[col].length)));
  return [title, ...cells.map((row) => row.map((cell, col) => cell.padStart(widths[col])).join('  '))].join('\n');
}

// Run one command body; a failure is a message on stderr and exit code 1.
function guarded(body: () => string): void {
  try {
    process.stdout.write(body() + '\n');
  } catch (e) {
    process.stderr.write(`overstrand: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 1;
  }
}

const codeOptions = (c: Command): Command =>
  c
    .option('--pd <json>', 'PD code as JSON, e.g. [[1,5,2,4],[3,1,4,6],[5,3,6,2]]')
    .option('--braid <word>', 'braid word, e.g. "1 1 1" (k > 0 is sigma_k)')
    .option('--dt <code>', 'DT code of a knot, e.g. "4 6 2"')
    .option('--unknots <n>', 'extra crossingless unknot components');

const program = new Command('overstrand').description('Invariants of link diagrams from PD codes, braid words and DT codes.');

codeOptions(program.command('invariants').description('crossings, writhe, bracket, Jones, Alexander, determinant, signature, linking, colourings, name'))
  .option('--json', 'print the answer as one JSON object (the batch format without id)')
  .option('--colourings <n>', 'modulus of the Fox colourings', '3')
  .action((o: CodeOptions & { json?: boolean; colourings: string }) =>
    guarded(() => {
      const a = answer(requestFrom(o, { n: Number(o.colourings) }));
      return o.json ? JSON.stringify(a) : summary(a);
    }),
  );

codeOptions(program.command('kh').description('Khovanov homology table (Bar-Natan grading)'))
  .addOption(new Option('--ring <ring>', "'Z', 'Q' or 'F<p>'").default('Z'))
  .option('--reduced', 'reduced homology')
  .option('--json', 'print {"kh": {...}} as JSON')
  .action((o: CodeOptions & { ring: string; reduced?: boolean; json?: boolean }) =>
    guarded(() => {
      const a = answer(requestFrom(o, { compute: ['kh'], ring: o.ring, reduced: o.reduced ?? false }));
      return o.json ? JSON.stringify(a) : khTable(a);
    }),
  );

program
  .command('batch')
  .description('JSON requests on stdin, one per line; one JSON answer per line on stdout, each with its id')
  .action(
    () =>
      new Promise<void>((resolve) => {
        process.stdin.on('error', (e) => {
          process.stderr.write(`overstrand: cannot read stdin: ${e.message}\n`);
          process.exitCode = 2;
          resolve();
        });
        const lines = createInterface({ input: process.stdin, crlfDelay: Infinity });
        lines.on('line', (line) => {
          if (line.trim() !== '') process.stdout.write(answerLine(line) + '\n');
        });
        lines.on('close', resolve);
      }),
  );

program.parseAsync(process.argv).catch((e: unknown) => {
  process.stderr.write(`overstrand: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
