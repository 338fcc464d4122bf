// Reidemeister moves of a band presentation's knot away from its bands, for invariance tests.
import { Saddle } from '@/shared/knot/bands';
import { diagram, Diagram } from '@/shared/knot/diagram';
import { addKink, faces, pushAcross, Rng } from '@/shared/knot/moves';
import { orient, PDCode } from '@/shared/knot/pd';
import { disks946, p33m3 } from './bands-fixtures';

/**
 * Random R1 and R2 moves (adding a kink or a finger) that keep away from the bands: no kink on a
 * band's edge, no finger in a face holding one. The moves keep the crossing order and slots of
 * the old crossings, so a band's edge is found again at its old head slot.
 */
export function movedAway(pd: PDCode, bands: Saddle[][], moves: number, rng: Rng): { pd: PDCode; bands: Saddle[][] } {
  let d: Diagram = diagram(pd);
  let current = bands;
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rng() * list.length)];
  for (let k = 0; k < moves; k++) {
    const busy = new Set(current.flat().flatMap(({ a, b }) => [a, b]));
    const free = [...new Set(d.pd.flat())].filter((l) => !busy.has(l));
    const quiet = faces(d.pd).filter((f) => f.length >= 2 && f.every((c) => !busy.has(d.pd[c.crossing][c.arrive])));
    const heads = orient(d.pd).head;
    const next = quiet.length > 0 && rng() < 0.5
      ? (() => {
          const f = pick(quiet);
          const i = Math.floor(rng() * f.length);
          return pushAcross(d, f, i, (i + 1 + Math.floor(rng() * (f.length - 1))) % f.length, rng() < 0.5);
        })()
      : addKink(d, pick(free), { sign: rng() < 0.5 ? 1 : -1, overFirst: rng() < 0.5 });
    const at = (l: number): number => next.pd[heads.get(l)!.crossing][heads.get(l)!.position];
    current = current.map((list) => list.map(({ a, b }) => ({ a: at(a), b: at(b) })));
    d = next;
  }
  return { pd: d.pd, bands: current };
}

/**
 * 9_46 with its two ribbon disks and the first disk's slid band, moved away from all three bands
 * together: the class tests over F_2 and over Z compare the same three surfaces.
 */
export function moved946(rng: Rng): { pd: PDCode; bands: Saddle[][] } {
  return movedAway(p33m3.pd, [disks946.first[0].saddles, disks946.second[0].saddles, disks946.first[1].saddles], 6, rng);
}
