// The public face of the knot core: diagrams, codes, invariants, families and moves.
export { connectedPieces, orient, parsePD, PDError, relabel, writhe } from './pd';
export type { Crossing, Oriented, PDCode, Slot } from './pd';
export { checkPlanar } from './moves/faces';
export { blackboardFramings, componentCount, diagram, framingsOf, unknot } from './diagram';
export type { Diagram, DiagramOptions } from './diagram';
export { assemble, directions } from './assemble';
export { braidStrands, checkBraid, fromBraid, parseBraid } from './braid';
export type { BraidWord } from './braid';
export { fromDT, interlacedGroups, MAX_DT_CROSSINGS, parseDT, toDT } from './dt';
export { fromGauss, toGauss } from './gauss';
export type { GaussCode } from './gauss';
export { bracket, bracketOfPD, loopFactor } from './bracket';
export { jones, jonesFromBracket } from './jones';
export { Laurent } from '@/shared/poly/laurent';
export * as families from './families';
export { cable, connectedSum, disjointUnion, mirror, pretzelLink, rationalLink, reverseComponent, sublink, torusLink, twistKnot } from './families';
export * as moves from './moves';
export { simplify } from './moves/simplify';
