// The framed-link data as one line each, with the components numbered as the picture numbers
// them (the Slate's drawing order; 1, 2, ... for a typed code): the Readout and a shared
// sketch's page say it the same way.
import { signed } from '@/shared/text/integers';
import type { ReadoutValues } from './readout';

/** `numbers[k]`: the number shown for diagram component k. */
export function framedText(framings: ReadoutValues['framings'], linking: ReadoutValues['linking'], numbers?: readonly number[]): { framings: string; linking: string | null } {
  const n = (k: number) => numbers?.[k] ?? k + 1;
  const f = framings.map((x, k) => ({ ...x, k: n(k) })).sort((p, q) => p.k - q.k);
  const l = linking.map((x) => ({ i: Math.min(n(x.i), n(x.j)), j: Math.max(n(x.i), n(x.j)), value: x.value })).sort((p, q) => p.i - q.i || p.j - q.j);
  return {
    framings: f.map((x) => `${x.k}: ${signed(x.value)}${x.blackboard ? ' bb' : ''}`).join('   '),
    linking: l.length ? l.map((x) => `lk(${x.i},${x.j}) = ${signed(x.value)}`).join('   ') : null,
  };
}
