// Bracket + Jones speed by tangle contraction, for braid closures and torus links of 15, 30,
// 60 and 100 crossings (goals: 15 crossings <= 5 ms, 60 crossings <= 1 s), with the ratio to
// the plain state sum where that is feasible (<= 20 crossings); then the wide cases (random
// 10-strand braids of 100 and 200 crossings, T(7,33)) with the widest cut of the
// tree-decomposition order and the number of state transitions it makes the contraction
// sum, measures that do not depend on the machine's load. Each braid closure is also timed by
// the Temperley-Lieb sweep of its braid word (bracketOfBraid), pasted as a PD code and drawn;
// last come two codes that are not closed braids.

import { readoutStages } from '@/lib/slate/readout';
import { analyse } from '@/shared/drawing/analyse';
import { fromBraid } from '@/shared/knot/braid';
import { bracket, bracketByContraction, bracketOfPD } from '@/shared/knot/bracket';
import { bracketOfBraid } from '@/shared/knot/bracket-braid';
import { braidClosure } from '@/shared/knot/braid-closure';
import { stateGraph } from '@/shared/knot/bracket-states';
import { contractionOrder } from '@/shared/knot/contraction-order';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { connectedSum } from '@/shared/knot/families';
import { jonesFromBracket } from '@/shared/knot/jones';
import { randomMoves, seededRng } from '@/shared/knot/moves/random';
import { stateSumBracket } from '@/shared/knot/statesum';
import { closedBraidSketch } from '@/shared/layout';
import { standardModules } from '@/shared/knot/temperley-lieb';
import { scramble } from '@/tests/shared/scramble';
import type { Line } from './timing';

const SIZES = [15, 30, 60, 100];
const STATE_SUM_LIMIT = 20;

function medianMs(f: () => unknown, budgetMs: number, maxRuns = 31): number {
  const times: number[] = [];
  const start = performance.now();
  while (times.length < maxRuns && (times.length < 3 || performance.now() - start < budgetMs)) {
    const t = performance.now();
    f();
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

/** A braid word, its strands and its closure. */
interface Braid {
  word: number[];
  strands: number;
  d: Diagram;
}

const braid = (word: number[], strands: number): Braid => ({ word, strands, d: fromBraid(word, strands) });

// A fixed pseudo-random braid using every generator in turn, seeded so runs compare; more
// strands make a wider cut.
function braidOf(strands: number, crossings: number): Braid {
  const rng = seededRng(crossings);
  return braid(Array.from({ length: crossings }, (_, i) => ((i % (strands - 1)) + 1) * (rng() < 0.5 ? 1 : -1)), strands);
}

// T(p, q) as the closure of (sigma_1 ... sigma_(p-1))^q, the diagram torusLink(p, q) draws.
const torus = (p: number, q: number): Braid => braid(Array.from({ length: (p - 1) * q }, (_, i) => (i % (p - 1)) + 1), p);

// T(p, q) with (p - 1) q = crossings: T(2,15), T(3,15), T(4,20), T(5,25).
const TORUS: Record<number, [number, number]> = { 15: [2, 15], 30: [3, 15], 60: [4, 20], 100: [5, 25] };

const goal = (n: number) => (n === 15 ? '<= 5 ms' : n === 60 ? '<= 1000 ms' : undefined);
const round = (x: number, digits = 2) => Number(x.toFixed(digits));

export function jonesBench(): Line[] {
  const lines: Line[] = [];
  const cases: [string, (n: number) => Braid][] = [
    ['braid closure (4 strands)', (n) => braidOf(4, n)],
    ['braid closure (8 strands)', (n) => braidOf(8, n)],
    ['torus link', (n) => torus(...TORUS[n])],
  ];
  for (const [family, make] of cases) {
    for (const n of SIZES) {
      const b = make(n);
      const d = b.d;
      const name = family === 'torus link' ? `T(${TORUS[n].join(',')})` : family;
      const ms = medianMs(() => jonesFromBracket(d, bracket(d)), 2000);
      lines.push({ name: `bracket+Jones, ${name}, ${d.pd.length} crossings`, value: round(ms), unit: 'ms', goal: goal(n) });
      const sweep = medianMs(() => jonesFromBracket(d, bracketOfBraid(b.word, b.strands)), 2000);
      lines.push({ name: `bracket+Jones by the braid sweep, ${name}, ${d.pd.length} crossings`, value: round(sweep), unit: 'ms', goal: goal(n) });
      if (d.pd.length <= STATE_SUM_LIMIT) {
        const slow = medianMs(() => stateSumBracket(d), 5000, 3);
        lines.push({ name: `state sum / contraction, ${name}, ${d.pd.length} crossings`, value: round(slow / ms, 0), unit: 'x' });
      }
    }
  }
  const wide: [string, Braid, string][] = [
    ['random 10-strand braid', braidOf(10, 100), '<= 100 ms'],
    ['random 10-strand braid', braidOf(10, 200), '<= 1000 ms'],
    ['T(7,33)', torus(7, 33), '<= 1000 ms'],
  ];
  // The tables of TL_10 on their own, before any 10-strand case builds them.
  const tables = performance.now();
  standardModules(10);
  lines.push({ name: 'Temperley-Lieb tables of TL_10 (standard modules, 252 link states), first call', value: round(performance.now() - tables), unit: 'ms', goal: '<= 100 ms' });
  for (const [name, b, target] of wide) {
    const d = b.d;
    // The Readout computes on the first draw: the first call of each case, before any repeat.
    const first = performance.now();
    jonesFromBracket(d, bracket(d));
    lines.push({ name: `bracket+Jones, ${name}, ${d.pd.length} crossings, first call`, value: round(performance.now() - first), unit: 'ms', goal: target });
    const ms = medianMs(() => jonesFromBracket(d, bracket(d)), 3000, 5);
    lines.push({ name: `bracket+Jones, ${name}, ${d.pd.length} crossings`, value: round(ms), unit: 'ms', goal: target });
    const order = contractionOrder(d.pd);
    lines.push({ name: `widest cut of the tree-decomposition order, ${name}, ${d.pd.length} crossings`, value: order.widest, unit: 'ends' });
    const transitions = stateGraph(d.pd, order.order).steps.reduce((sum, step) => sum + step.target.length, 0);
    lines.push({ name: `state transitions summed in that order, ${name}, ${d.pd.length} crossings`, value: transitions, unit: 'transitions' });
    const sweep = medianMs(() => jonesFromBracket(d, bracketOfBraid(b.word, b.strands)), 3000, 5);
    lines.push({ name: `bracket+Jones by the braid sweep, ${name}, ${d.pd.length} crossings`, value: round(sweep), unit: 'ms', goal: target });
  }
  lines.push(...pastedBraidLines(), drawnBraidLine(), ...nonBraidLines());
  return lines;
}

// The random 10-strand braid of 100 crossings as a pasted PD code (labels renamed, crossings
// shuffled): bracketOfPD has only the code, and finds the braid in it (braid-closure.ts).
function pastedBraidLines(): Line[] {
  const d = braidOf(10, 100).d;
  const pasted = diagram(scramble(d.pd, seededRng(1)).pd);
  const name = `random 10-strand braid as a pasted PD code, ${d.pd.length} crossings`;
  return [
    { name: `bracket+Jones through bracketOfPD, ${name}`, value: round(medianMs(() => jonesFromBracket(pasted, bracketOfPD(pasted.pd)), 3000, 5)), unit: 'ms', goal: '<= 100 ms' },
    { name: `recognising it as a braid closure, ${name}`, value: round(medianMs(() => braidClosure(pasted.pd), 1000), 3), unit: 'ms' },
  ];
}

// The same braid drawn as a closed braid and read back, as the Readout's bracket stage gets it
// from the slate (the drawing's own labels and crossing order).
function drawnBraidLine(): Line {
  const { word, strands } = braidOf(10, 100);
  const d = analyse(closedBraidSketch(word, strands)!).diagram!.diagram;
  const stage = readoutStages.find((s) => s.keys.includes('bracket'))!;
  const name = `bracket+Jones through the Readout's stage, random 10-strand braid drawn as a closed braid, ${d.pd.length} crossings`;
  return { name, value: round(medianMs(() => stage.run(d, {}), 3000, 5)), unit: 'ms', goal: '<= 100 ms' };
}

// Codes that are not closed braids, for the general contraction: an 8-strand closure after
// random Reidemeister moves, and a connected sum of two random 10-strand closures drawn side
// by side (split into its summands, each a closed braid for the sweep; the contraction alone
// beside it).
function nonBraidLines(): Line[] {
  const moved = randomMoves(braidOf(8, 50).d, 40, 5);
  const sum = connectedSum(braidOf(10, 100).d, braidOf(10, 101).d);
  const jonesMs = (d: Diagram, runs: number) => round(medianMs(() => jonesFromBracket(d, bracket(d)), 3000, runs));
  return [
    { name: `bracket+Jones, 8-strand braid of 50 crossings after 40 random moves, ${moved.pd.length} crossings`, value: jonesMs(moved, 31), unit: 'ms' },
    { name: `bracket+Jones, connected sum of two random 10-strand braids side by side, ${sum.pd.length} crossings`, value: jonesMs(sum, 5), unit: 'ms' },
    { name: `bracket by the contraction alone, the same connected sum, ${sum.pd.length} crossings`, value: round(medianMs(() => bracketByContraction(sum.pd), 3000, 3)), unit: 'ms' },
  ];
}
