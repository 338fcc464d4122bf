// Linking numbers of all pairs of components, sorted: a list that does not depend on how the
// components are numbered, and without the diagonal (the framing, which an R1 move changes).
import { Diagram } from '@/shared/knot/diagram';
import { linkingMatrix } from '@/shared/knot/linking';

export const pairwiseLinking = (d: Diagram): number[] => linkingMatrix(d).flatMap((row, i) => row.filter((_, j) => j > i)).sort((x, y) => x - y);
