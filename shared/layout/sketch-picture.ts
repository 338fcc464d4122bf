// A drawing on the Slate as a picture other pictures are made from (a summand of a connected
// sum keeps the picture it has): its closed paths in the order of its diagram's components,
// its crossings with their signs, its framings.

import { analyse } from '@/shared/drawing/analyse';
import { Sketch } from '@/shared/drawing/sketch';
import type { Picture } from './sum-picture';

/** null when the drawing does not read as a diagram (a marker, no closed strand). */
export function sketchPicture(sketch: Sketch): Picture | null {
  const a = analyse(sketch);
  if (!a.diagram) return null;
  const byId = new Map(a.paths.map((p) => [p.id, p.points]));
  return {
    paths: a.diagram.componentIds.map((id) => byId.get(id)!),
    crossings: a.crossings.map((c) => ({ at: c.at, sign: c.sign })),
    framings: a.diagram.diagram.framings,
  };
}
