// Moves on diagrams and braids.
export { checkPlanar, faces } from './faces';
export type { Corner } from './faces';
export { braidRelation, conjugate, destabilise, insertInverses, randomMarkovMove, stabilise } from './markov';
export type { Braid } from './markov';
export { addKink, kinks, removeKink } from './r1';
export type { Kink } from './r1';
export { addBigon, bigons, pushAcross, removeBigon } from './r2';
export type { Bigon } from './r2';
export { applyR3, triangles } from './r3';
export { randomMove, randomMoves, seededRng } from './random';
export type { MoveKind, Rng } from './random';
export { simplify, simplifySteps } from './simplify';
export type { Removal } from './simplify';
export { splice } from './splice';
