// The checkerboard colouring of the faces of a PD code. Corner p of a crossing is the sector
// between positions p and p+1 (counterclockwise), where a face walk (moves/faces.ts) arrives
// through p. Planarity itself is checked by diagram() (checkPlanar in moves/faces.ts); a failed
// colouring is reported too.
import { faces } from './moves/faces';
import { connectedPieces, PDCode, PDError } from './pd';

export interface Faces {
  /** faceOf[crossing][p]: the face containing corner p of that crossing. */
  readonly faceOf: readonly (readonly number[])[];
  readonly count: number;
  /** 0 or 1 per face; faces sharing an edge differ. */
  readonly colour: readonly number[];
  /** Connected pieces of the diagram, as crossing indices. */
  readonly pieces: readonly (readonly number[])[];
}

export function facesOf(pd: PDCode): Faces {
  const faceOf = pd.map(() => [-1, -1, -1, -1]);
  const all = faces(pd);
  all.forEach((face, f) => face.forEach((corner) => (faceOf[corner.crossing][corner.arrive] = f)));
  return { faceOf, count: all.length, colour: checkerboard(faceOf, all.length), pieces: connectedPieces(pd) };
}

// Corners p and p+1 of a crossing lie on either side of edge p+1, so their faces differ.
function checkerboard(faceOf: number[][], count: number): number[] {
  const neighbours: number[][] = Array.from({ length: count }, () => []);
  for (const corners of faceOf) {
    for (let p = 0; p < 4; p++) {
      const [f, g] = [corners[p], corners[(p + 1) % 4]];
      neighbours[f].push(g);
      neighbours[g].push(f);
    }
  }
  const colour = new Array<number>(count).fill(-1);
  for (let start = 0; start < count; start++) {
    if (colour[start] >= 0) continue;
    colour[start] = 0;
    const queue = [start];
    while (queue.length > 0) {
      const f = queue.pop()!;
      for (const g of neighbours[f]) {
        if (colour[g] < 0) {
          colour[g] = 1 - colour[f];
          queue.push(g);
        } else if (colour[g] === colour[f]) {
          throw new PDError('the faces of the PD code admit no checkerboard colouring: it is not planar');
        }
      }
    }
  }
  return colour;
}
