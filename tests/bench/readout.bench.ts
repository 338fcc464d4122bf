// The Readout's cost beyond "stroke end -> diagram + Jones" (drawing.bench.ts): all its stages
// (basic counts and linking, bracket + Jones, determinant + signature, Alexander, name) for the
// closures of (sigma_1 sigma_2^-1)^k with 5, 15 and 30 crossings. Stages run one per task off
// the gesture path, so the longest stage is what can hold up an input event (goal: one 16 ms
// frame at 15 crossings).
import { fromBraid } from '@/shared/knot/braid';
import { readoutStages, type ReadoutValues } from '@/lib/slate/readout';
import { median, round, type Line } from './timing';

const word = (n: number) => Array.from({ length: n }, (_, i) => (i % 2 === 0 ? 1 : -2));

export function readoutBench(runs = 15): Line[] {
  return [5, 15, 30].flatMap((n) => {
    const d = fromBraid(word(n));
    const perStage = readoutStages.map(() => [] as number[]);
    for (let r = 0; r < runs; r++) {
      const done: Partial<ReadoutValues> = {};
      readoutStages.forEach((s, i) => {
        const t0 = performance.now();
        Object.assign(done, s.run(d, done));
        perStage[i].push(performance.now() - t0);
      });
    }
    const medians = perStage.map(median);
    const longest = medians.indexOf(Math.max(...medians));
    return [
      { name: `readout: all stages, ${n} crossings (median of ${runs})`, value: round(medians.reduce((a, b) => a + b, 0)), unit: 'ms' },
      {
        name: `readout: longest stage (${readoutStages[longest].keys.join(', ')}), ${n} crossings`,
        value: round(medians[longest]),
        unit: 'ms',
        ...(n === 15 && { goal: '<= 16 ms' }),
      },
    ];
  });
}
