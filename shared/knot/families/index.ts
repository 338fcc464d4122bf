// Generators of standard links and operations on diagrams.
export { cable } from './cable';
export { mirror } from './mirror';
export { capped, neighbourCaps } from './plat';
export type { Caps } from './plat';
export { pretzelLink } from './pretzel';
export { rationalLink } from './rational';
export { reverseComponent } from './reverse';
export { connectedSum } from './sum';
export { torusLink } from './torus';
export { twistKnot } from './twist';
export { disjointUnion } from './union';
export { sublink } from './sublink';
