// PD code to planar picture: the public API of shared/layout.

export { layoutPD } from './layout';
export type { LinkLayout, LayoutCrossing, LayoutOptions } from './layout';
export { layoutToSketch } from './to-sketch';
export { closedBraidSketch } from './closed-braid';
export { pretzelSketch } from './pretzel-picture';
export { cableSketch } from './cable-picture';
export { sumSketch } from './sum-picture';
export type { Picture } from './sum-picture';
export { pretzelPicture } from './pretzel-picture';
export { sketchPicture } from './sketch-picture';
