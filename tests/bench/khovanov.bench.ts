// Khovanov homology timings and memory: T(5,6) over Z (goal <= 10 s), T(6,7) over Q (<= 20 s),
// T(9,5) over Z (<= 60 s, <= 2 GB), and two 14-crossing knots against the reference cube
// (goal >= 1000x), the trefoil's 2- and 3-cables, and 2-cables glued from their grids
// (parts.ts) against crossing by crossing. Torus links come from the knot core as braid
// closures on p strands.
// Memory is the process's resident set (rss), sampled after every merged crossing; the cube
// is sampled once at its end, a lower bound of its peak.
// Then cables at research scale, each run once and stopped after CAP_S seconds ("over" the cap
// then), with its cpu time, peak rss, widest open boundary, most objects, the Euler check
// (q + q^-1) V of every result, and the widest cut of the engine's crossing order and of the
// greedy and tree-decomposition orders it starts from. KH_ONLY=<text> runs only the cable
// items whose name (with its ring, e.g. "T(8,8) over Q") contains that text, the sweep for
// "sweep" and the first part for "goals", so one item can be measured alone.

import { khovanov, KhCancelled, KhRing, Progress } from '@/shared/khovanov';
import { cubeKhovanov } from '@/shared/khovanov/cube';
import { fastKhovanov } from '@/shared/khovanov/engine';
import { crossingOrder, greedyOrder } from '@/shared/khovanov/order';
import { contractionOrder, scoreOrder } from '@/shared/knot/contraction-order';
import { fromBraid } from '@/shared/knot/braid';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { cable } from '@/shared/knot/families/cable';
import { torusLink } from '@/shared/knot/families/torus';
import { seededRng } from '@/shared/knot/moves';
import { orient, PDCode } from '@/shared/knot/pd';
import { integers } from '@/shared/linalg/ring';
import { randomWord } from '@/tests/shared/khovanov-fixtures';
import { loadavg } from 'os';
import type { Line } from './timing';

const MB = 1024 * 1024;

const wanted = (name: string): boolean => process.env.KH_ONLY === undefined || name.includes(process.env.KH_ONLY);

// Sampling memory reads /proc (about 0.3 ms a call, 5 ms of a 25 ms run), so runs that report
// no memory are timed without it.
function timeEngine(pd: PDCode, ring: KhRing, runs: number, sampleMemory = true): { ms: number; fastest: number; rssMB: number; heapMB: number; boundary: number; groups: string } {
  const times: number[] = [];
  let rss = 0;
  let heap = 0;
  let boundary = 0;
  let groups = '';
  for (let r = 0; r < runs; r++) {
    const sample = (p?: Progress) => {
      if (!sampleMemory) return;
      const m = process.memoryUsage();
      rss = Math.max(rss, m.rss);
      heap = Math.max(heap, m.heapUsed);
      boundary = Math.max(boundary, p?.boundary ?? 0);
    };
    const t = performance.now();
    const result = khovanov(pd, { ring, eulerCheck: false, onProgress: sampleMemory ? sample : undefined });
    times.push(performance.now() - t);
    sample();
    groups = JSON.stringify(result.groups);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(times.length / 2)], fastest: times[0], rssMB: rss / MB, heapMB: heap / MB, boundary, groups };
}

const round = (x: number, digits = 0) => Number(x.toFixed(digits));

/** The widest cut of the engine's crossing order, beside those of the greedy and the tree-decomposition order it starts from. */
const orderLine = (label: string, pd: PDCode): Line => ({
  name: `${label}, widest cut of the engine's order (of the greedy / of the tree-decomposition order)`,
  value: scoreOrder(pd, crossingOrder(pd)).widest,
  unit: `(${scoreOrder(pd, greedyOrder(pd).order).widest} / ${contractionOrder(pd).widest}) points`,
});

/** Seconds after which a research-scale run is stopped. */
const CAP_S = 180;

// One run of a large diagram, stopped at the cap; figures that do not depend on load beside the time.
function cableLines(name: string, d: Diagram, ring: KhRing, goal?: string, memGoal?: string): Line[] {
  let rss = 0;
  let boundary = 0;
  let objects = 0;
  let merged = 0;
  const start = performance.now();
  const deadline = start + CAP_S * 1000;
  const signal = { get aborted() { return performance.now() > deadline; } };
  const sample = (p: Progress) => {
    rss = Math.max(rss, process.memoryUsage().rss);
    boundary = Math.max(boundary, p.boundary);
    objects = Math.max(objects, p.objects);
    merged = p.merged;
  };
  let euler: boolean | undefined;
  const cpuStart = process.cpuUsage();
  try {
    euler = khovanov(d.pd, { ring, unknots: d.unknots, onProgress: sample, signal }).euler?.ok;
  } catch (e) {
    if (!(e instanceof KhCancelled)) throw e;
  }
  const s = (performance.now() - start) / 1000;
  const cpu = process.cpuUsage(cpuStart);
  const label = `kh: ${name} (${d.pd.length} crossings) over ${ring}`;
  const done = euler !== undefined;
  return [
    { name: `${label}, ${done ? 'time' : `stopped at the cap, over`}`, value: round(done ? s : CAP_S, 1), unit: 's', goal },
    // On a shared machine the wall time grows with the load; the process's cpu time much less.
    { name: `${label}, cpu time${done ? '' : ' so far'}`, value: round((cpu.user + cpu.system) / 1e6, 1), unit: 's' },
    { name: `${label}, peak rss${done ? '' : ' so far'}`, value: round(rss / MB), unit: 'MB', goal: memGoal },
    { name: `${label}, widest open boundary${done ? '' : ' so far'}`, value: boundary, unit: 'points' },
    { name: `${label}, most objects${done ? '' : ' so far'}`, value: objects, unit: 'objects' },
    // How far a run stopped at the cap got, to compare two engines that both miss it.
    ...(done ? [] : [{ name: `${label}, crossings merged at the cap`, value: merged, unit: `/ ${d.pd.length}` }]),
    orderLine(label, d.pd),
    ...(done ? [{ name: `${label}, Euler characteristic = (q + q^-1) V`, value: euler ? 1 : 0, unit: euler ? '(yes)' : '(NO)', goal: '1' }] : []),
    // The machine is shared: the load beside the figures says how far the wall time is to be trusted.
    { name: `${label}, load average (1 min) at its end`, value: round(loadavg()[0], 2), unit: '' },
  ];
}

const trefoil = fromBraid([1, 1, 1]);
/** (a, b): a parallel copies of the first component of the 0-framed Hopf link, b of the second. */
const hopfCable = (a: number, b: number): Diagram => {
  const first = cable(fromBraid([1, 1]), 0, a, 0);
  return cable(first, orient(first.pd).components.length - 1, b, 0);
};

/** Seeded 6-strand braids of 40 letters whose closures have two components. */
function twoComponentBraids(count: number): number[][] {
  const rnd = seededRng(20261202);
  const out: number[][] = [];
  while (out.length < count) {
    const w = randomWord(rnd, 6, 40);
    if (orient(fromBraid(w).pd).components.length === 2) out.push(w);
  }
  return out;
}

export function cableBench(): Line[] {
  const lines: Line[] = [];
  const runs: [string, Diagram, KhRing, string?, string?][] = [
    ['T(7,7)', torusLink(7, 7), 'Z'],
    ['T(8,8)', torusLink(8, 8), 'Q', '<= 30 s'],
    ['T(8,9)', torusLink(8, 9), 'Z', '<= 180 s'],
    ['(3,0)-cable of the blackboard trefoil', cable(trefoil, 0, 3, 0), 'Q'],
    ['(3,0)-cable of the figure-eight (closure of s1 s2^-1 s1 s2^-1, blackboard = 0-framed)', cable(fromBraid([1, -2, 1, -2]), 0, 3, 0), 'Q', '<= 20 s'],
    ['(4,4)-cable of the 0-framed Hopf link', hopfCable(4, 4), 'Q'],
    ['(5,5)-cable of the 0-framed Hopf link', hopfCable(5, 5), 'Z', '<= 120 s'],
    ['(4,0)-cable of the blackboard trefoil', cable(trefoil, 0, 4, 0), 'Q', '<= 120 s', '<= 4096 MB'],
    ['(4,0)-cable of the blackboard trefoil', cable(trefoil, 0, 4, 0), 'Z', '<= 300 s'],
    ...twoComponentBraids(2).map((w, k): [string, Diagram, KhRing] => [`seeded 2-component 6-strand braid ${k + 1}`, fromBraid(w), 'Q']),
  ];
  for (const [name, d, ring, goal, memGoal] of runs) if (wanted(`${name} over ${ring}`)) lines.push(...cableLines(name, d, ring, goal, memGoal));
  if (!wanted('sweep')) return lines;

  // The sweep r+ + r- <= 3 of the 0-framed right trefoil over Q: every cell, then the total.
  const trefoil0 = diagram(trefoil.pd, { framings: [0] });
  let total = 0;
  for (let r = 1; r <= 3; r++) {
    for (let rMinus = 0; rMinus <= r; rMinus++) {
      const cell = cableLines(`(${r - rMinus},${rMinus})-cable of the 0-framed trefoil`, cable(trefoil0, 0, r - rMinus, rMinus), 'Q');
      total += cell[0].value;
      lines.push(...cell);
    }
  }
  lines.push({ name: 'kh: sweep r+ + r- <= 3 of the 0-framed trefoil over Q, total', value: round(total, 1), unit: 's', goal: '<= 300 s' });
  return lines;
}

export function khovanovBench(): Line[] {
  const lines: Line[] = [];
  if (!wanted('goals')) return lines;
  const goals: [string, PDCode, KhRing, string, string?][] = [
    ['T(5,6) over Z', torusLink(5, 6).pd, 'Z', '<= 10000 ms'],
    ['T(6,7) over Q', torusLink(6, 7).pd, 'Q', '<= 20000 ms'],
    ['T(9,5) over Z (9-strand braid, 40 crossings)', torusLink(9, 5).pd, 'Z', '<= 60000 ms', '<= 2048 MB'],
  ];
  for (const [name, pd, ring, timeGoal, memGoal] of goals) {
    const r = timeEngine(pd, ring, 3);
    lines.push({ name: `kh: ${name}, median of 3`, value: round(r.ms), unit: 'ms', goal: timeGoal });
    lines.push({ name: `kh: ${name}, peak rss`, value: round(r.rssMB), unit: 'MB', goal: memGoal });
    lines.push({ name: `kh: ${name}, peak heap used`, value: round(r.heapMB), unit: 'MB' });
    lines.push({ name: `kh: ${name}, widest open boundary`, value: r.boundary, unit: 'points' });
    lines.push(orderLine(`kh: ${name}`, pd));
  }

  // Blackboard-framed (r, 0)-cables of the right trefoil (closure of s1^3): 12 and 27 crossings.
  // The 4-cable (48 crossings, open boundary 14) is left out: it outgrows 2 GB.
  for (const r of [2, 3]) {
    const c = timeEngine(cable(fromBraid([1, 1, 1]), 0, r, 0).pd, 'Z', 3);
    lines.push({ name: `kh: trefoil ${r}-cable over Z, median of 3`, value: round(c.ms), unit: 'ms' });
    lines.push({ name: `kh: trefoil ${r}-cable over Z, peak rss`, value: round(c.rssMB), unit: 'MB' });
  }

  // Divide and conquer (parts.ts) against crossing by crossing on 2-cables: each original
  // crossing's 2 x 2 grid (4 consecutive crossings of the cable code) is built once and the
  // copies glued on in turn.
  for (const [name, knot] of [['trefoil', [1, 1, 1]], ['figure-eight', [1, -2, 1, -2]]] as const) {
    const pd = cable(fromBraid(knot), 0, 2, 0).pd;
    const grids = Array.from({ length: pd.length / 4 }, (_, g) => [0, 1, 2, 3].map((i) => 4 * g + i));
    const median = (run: () => void): number => {
      const times = [0, 1, 2].map(() => {
        const t = performance.now();
        run();
        return performance.now() - t;
      });
      return times.sort((a, b) => a - b)[1];
    };
    const sequential = median(() => fastKhovanov(pd, integers));
    const glued = median(() => fastKhovanov(pd, integers, { parts: grids }));
    lines.push({ name: `kh: ${name} 2-cable over Z, grids built once and glued / crossing by crossing, medians of 3`, value: round(glued), unit: `/ ${round(sequential)} ms` });
  }

  // The cube's growth on the same alternating family, then both 14-crossing knots in full.
  const alternating = (k: number) => fromBraid(Array.from({ length: k }, () => [1, -2]).flat()).pd;
  for (const k of [4, 5]) {
    const t = performance.now();
    cubeKhovanov(alternating(k), integers);
    lines.push({ name: `kh: reference cube, closure of (s1 s2^-1)^${k} (${2 * k} crossings) over Z`, value: round(performance.now() - t), unit: 'ms' });
  }
  const knots: [string, PDCode][] = [
    ['T(3,7) (14 crossings, positive braid)', torusLink(3, 7).pd],
    ['closure of (s1 s2^-1)^7 (14 crossings, alternating)', alternating(7)],
  ];
  // Engines first, so the cube's garbage does not slow them down.
  const fast = knots.map(([, pd]) => timeEngine(pd, 'Z', 9, false));
  knots.forEach(([name, pd], k) => {
    const t = performance.now();
    const cube = JSON.stringify(cubeKhovanov(pd, integers));
    const cubeMs = performance.now() - t;
    const cubeRss = process.memoryUsage().rss / MB;
    if (cube !== fast[k].groups) throw new Error(`engine and cube disagree on ${name}`);
    lines.push({ name: `kh: ${name}, engine over Z, median of 9`, value: round(fast[k].ms, 1), unit: 'ms' });
    lines.push({ name: `kh: ${name}, engine over Z, fastest of 9`, value: round(fast[k].fastest, 1), unit: 'ms' });
    lines.push({ name: `kh: ${name}, reference cube over Z`, value: round(cubeMs), unit: 'ms' });
    lines.push({ name: `kh: ${name}, cube rss at its end`, value: round(cubeRss), unit: 'MB' });
    lines.push({ name: `kh: ${name}, cube time / engine median`, value: round(cubeMs / fast[k].ms), unit: 'x', goal: '>= 1000 x' });
    lines.push({ name: `kh: ${name}, cube time / engine fastest`, value: round(cubeMs / fast[k].fastest), unit: 'x' });
  });
  return lines;
}

if (require.main === module) {
  for (const l of [...khovanovBench(), ...cableBench()]) console.log(`${l.name}: ${l.value} ${l.unit}${l.goal ? ` (goal ${l.goal})` : ''}`);
}
