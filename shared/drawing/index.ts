// Strokes to link diagrams: the public API of shared/drawing.

export type { Point } from './point';
export { defaultOptions } from './options';
export type { DrawingOptions } from './options';
export { smoothPath, chaikin, resample } from './smooth';
export {
  emptySketch,
  addStroke,
  addPath,
  componentById,
  reverseComponent,
  setFraming,
  deleteComponent,
  moveComponent,
  reshapeComponent,
  nearestPointIndex,
  flipCrossing,
} from './sketch';
export type { Sketch, SketchComponent, Flip } from './sketch';
export { historyOf, commit, undo, redo, canUndo, canRedo } from './history';
export type { History } from './history';
export { analyse } from './analyse';
export type { Analysis, DrawnPath, DrawnCrossing, Gap, DrawnDiagram } from './analyse';
export type { Marker, MarkerKind } from './crossings';
export { visiblePieces, gapsAround } from './pieces';
export { toSVG, toTikZ, chalkPalette } from './export';
export type { ExportOptions } from './export';
export { crossingNear, componentNear, arrowOf } from './pick';
export { carryFlips } from './carry';
export { addBand, deleteBand, setBandTwists, flipBandCrossing, bandsOf, bandSnapRadius } from './bands';
export type { Band, BandUnder, BandEdit } from './bands';
export { bandShapes } from './band-shape';
export type { BandShape, CoreCrossing } from './band-shape';
export { readBands } from './band-read';
export type { BandDrawings, Saddle } from './band-read';
