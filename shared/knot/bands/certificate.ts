// What a band presentation certifies. b bands from an n-component link L to a diagram of the
// c-component unlink, with c disks capping the unlink, give an orientable surface F in B^4 with
// boundary L and Euler characteristic chi = c - b (each band lowers chi by one, each disk adds
// one). F has k components (the components of L joined by bands); each contains a component of
// L, since bands only merge and split, so its total genus is g = (2k - n - chi) / 2; for a knot
// k = n = 1 and g4(K) <= g = (b - c + 1) / 2. Ribbon: every component of F is a disk (genus 0,
// k = n), for a knot c = b + 1. The unlink is certified when simplification leaves no crossing,
// or when Kh(D'; Z) is that of the c-component unlink as a bigraded group: Khovanov homology
// detects unlinks (Kronheimer and Mrowka, "Khovanov homology is an unknot-detector", 2011,
// arXiv 1005.4346; Hedden and Ni, "Khovanov module and the detection of unlinks", 2013,
// arXiv 1204.0960; Batson and Seed, "A link-splitting spectral sequence in Khovanov homology",
// 2015, arXiv 1303.6240, for the bigraded group). The rank alone does not do for links: the
// Hopf link has rank 4 = 2^2, like the 2-component unlink (Khovanov 2000, arXiv math/9908171).

import { khovanov, type KhGroup } from '../../khovanov';
import { labelClasses } from '../label-classes';
import { AfterBands, simplifiedStage } from './after';
import { Stage } from './saddle';
import { BandPresentation } from './types';

export type UnlinkCertificate = 'crossingless' | 'khovanov' | 'none' | 'too-large';

export interface BandCertificate {
  /** n: components of the link before the bands. */
  knotComponents: number;
  /** c: components after the bands. */
  components: number;
  /** b: the number of bands. */
  bands: number;
  /** Euler characteristic of the surface: chi = c - b. */
  chi: number;
  /** k: connected components of the surface. */
  surfaceComponents: number;
  /** Total genus (2k - n - chi) / 2 of the surface, a bound on g4 for a knot; null without a certified unlink. */
  genusBound: number | null;
  unlink: UnlinkCertificate;
  /** Certified unlink and every component of the surface a disk (for a knot: c = b + 1). */
  ribbon: boolean;
  after: AfterBands;
  /** The crossing limit of the Khovanov check over Z (on the simplified after-bands diagram). */
  maxCrossings: number;
}

/**
 * The Khovanov check's default limit on the simplified diagram's crossings: Kh over Z of a
 * 20-crossing pretzel diagram took about 1 s here, of 30-crossing ones 11 s to 190 s.
 */
export const UNLINK_CROSSINGS = 20;

/** Kh over Z of the diagram after the bands, for the unlink check. */
export type AfterHomology = (after: AfterBands) => readonly KhGroup[];

const engine: AfterHomology = (after) => khovanov(after.pd, { ring: 'Z', unknots: after.unknots, eulerCheck: false }).groups;

/** `homology` computes Kh over Z of the simplified result (a server run passes one with progress). */
export function certify(p: BandPresentation, stages: Stage[], maxCrossings = UNLINK_CROSSINGS, homology = engine): BandCertificate {
  const after = simplifiedStage(stages[stages.length - 1], p.unknots);
  const c = after.components;
  const b = p.saddles.length;
  const chi = c - b;
  const { links, surfaces } = joined(stages[0], p);
  const n = links + p.unknots;
  const k = surfaces + p.unknots;
  const unlink = unlinkCertificate(after, maxCrossings, homology);
  const certified = unlink === 'crossingless' || unlink === 'khovanov';
  const genusBound = certified ? (2 * k - n - chi) / 2 : null;
  return { knotComponents: n, components: c, bands: b, chi, surfaceComponents: k, genusBound, unlink, ribbon: genusBound === 0 && k === n, after, maxCrossings };
}

function unlinkCertificate(after: AfterBands, maxCrossings: number, homology: AfterHomology): UnlinkCertificate {
  if (after.pd.length === 0) return 'crossingless';
  if (after.pd.length > maxCrossings) return 'too-large';
  const groups = homology(after);
  // Kh(U_c) = (Z at q = 1 and q = -1)^(x c), at h = 0: rank C(c, m) at q = c - 2m.
  const c = after.components;
  const binomial = (m: number): number => (m === 0 ? 1 : (binomial(m - 1) * (c - m + 1)) / m);
  const expected = (j: number): number => ((c - j) % 2 === 0 && Math.abs(j) <= c ? binomial((c - j) / 2) : 0);
  const rank = groups.reduce((sum, g) => sum + g.free, 0);
  const like = groups.every((g) => g.i === 0 && g.torsion.length === 0 && g.free === expected(g.j));
  // Every group matching and the total rank 2^c: no group of the unlink is missing.
  return like && rank === 2 ** c ? 'khovanov' : 'none';
}

// Components of the link (PD part) and of the surface's PD part: labels joined along the link's
// components and by every band.
function joined(start: Stage, p: BandPresentation): { links: number; surfaces: number } {
  const { find, join } = labelClasses();
  for (const [label, h] of start.heads) join(label, start.pd[h.crossing][(h.position + 2) % 4]);
  const count = (): number => [...start.heads.keys()].filter((l) => find(l) === l).length;
  const links = count();
  for (const { a, b } of p.saddles) join(a, b);
  return { links, surfaces: count() };
}
