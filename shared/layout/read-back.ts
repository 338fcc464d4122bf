// The check every standard picture passes before it is drawn: the analysis reads the sketch
// back with no degeneracy marker, as many crossings as the diagram it stands for, the same
// number of components and the same Jones polynomial (an invariant of the link, so a picture
// of another link is caught unless they share it; the crossing count keeps extra twists out).

import { analyse } from '@/shared/drawing/analyse';
import { Sketch } from '@/shared/drawing/sketch';
import { componentCount, Diagram } from '@/shared/knot/diagram';
import { jones } from '@/shared/knot/jones';

export function readsBack(sketch: Sketch, target: Diagram): boolean {
  const a = analyse(sketch);
  const read = a.diagram?.diagram;
  return !!read && a.markers.length === 0 && read.pd.length === target.pd.length && componentCount(read) === componentCount(target) && jones(read).toString() === jones(target).toString();
}
