// The Readout's values, computed in stages so the quick ones show first and each value knows
// whether it is current. Pure: the hook (useReadout) schedules the stages off the gesture path.
import { alexander } from '@/shared/knot/alexander';
import { subscript } from '@/shared/text/integers';
import { bracket } from '@/shared/knot/bracket';
import { componentCount, framingsOf, type Diagram } from '@/shared/knot/diagram';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { homfly } from '@/shared/knot/homfly';
import { jonesFromBracket } from '@/shared/knot/jones';
import { linkingMatrix } from '@/shared/knot/linking';
import { guessName } from '@/shared/knot/names';
import { orient, writhe } from '@/shared/knot/pd';
import type { Poly2 } from '@/shared/knot/poly2';
import type { Laurent } from '@/shared/poly/laurent';

export interface ReadoutValues {
  crossings: number;
  components: number;
  writhe: number;
  /** Framing of each component (blackboard resolved) and whether it is the blackboard one. */
  framings: { value: number; blackboard: boolean }[];
  /** Linking number of each pair i < j. */
  linking: { i: number; j: number; value: number }[];
  bracket: Laurent;
  jones: Laurent;
  determinant: bigint;
  signature: number;
  alexander: { polynomial: Laurent; conwaySign: boolean };
  /** null when no guess applies (a link, or not in the table). */
  name: { text: string; name: string; mirror: boolean } | null;
  /** null beyond HOMFLY_DEVICE_LIMIT crossings. */
  homfly: Poly2 | null;
}

/**
 * The HOMFLY-PT skein tree grows exponentially in the worst case: up to this many crossings it
 * takes well under a second on a phone (the homfly benchmark: 15 crossings in tens of ms).
 */
export const HOMFLY_DEVICE_LIMIT = 16;

export type ReadoutKey = keyof ReadoutValues;

type Partial = { [K in ReadoutKey]?: ReadoutValues[K] };

/** Each stage needs only the diagram and what earlier stages found. */
export const readoutStages: readonly { keys: readonly ReadoutKey[]; run: (d: Diagram, done: Partial) => Partial }[] = [
  {
    keys: ['crossings', 'components', 'writhe', 'framings', 'linking'],
    run: (d) => {
      const o = orient(d.pd);
      const m = linkingMatrix(d);
      const resolved = framingsOf(d, o);
      return {
        crossings: d.pd.length,
        components: componentCount(d),
        writhe: writhe(o),
        framings: resolved.map((value, i) => ({ value, blackboard: d.framings[i] === null })),
        linking: m.flatMap((row, i) => row.flatMap((value, j) => (j > i ? [{ i, j, value }] : []))),
      };
    },
  },
  {
    keys: ['bracket', 'jones'],
    run: (d) => {
      const b = bracket(d);
      return { bracket: b, jones: jonesFromBracket(d, b) };
    },
  },
  { keys: ['determinant', 'signature'], run: (d) => ({ determinant: linkDeterminant(d), signature: linkSignature(d) }) },
  { keys: ['alexander'], run: (d) => ({ alexander: alexander(d) }) },
  {
    keys: ['name'],
    run: (d, done) => {
      const g = guessName(d, done.jones);
      return { name: g ? { text: g.text, name: g.name, mirror: g.mirror } : null };
    },
  },
  // Last: the slowest stage, so every other value is already shown while it runs.
  { keys: ['homfly'], run: (d) => ({ homfly: d.pd.length <= HOMFLY_DEVICE_LIMIT ? homfly(d) : null }) },
];

/** All values at once (tests, exports). */
export function computeReadout(d: Diagram): ReadoutValues {
  return readoutStages.reduce<Partial>((done, s) => ({ ...done, ...s.run(d, done) }), {}) as ReadoutValues;
}

/** "3_1" as TeX, 3_{1}; a mirror is said in words beside it (docs/conventions.md, Names). */
export const nameTeX = (name: string): string => {
  const [n, k] = name.split('_');
  return `${n}_{${k}}`;
};

/** "3_1" as "3₁": what screen readers and the native build show in the TeX's place. */
export const nameUnicode = (name: string): string => {
  const [n, k] = name.split('_');
  return n + subscript(k);
};
