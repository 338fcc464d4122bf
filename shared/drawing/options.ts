// Distances (in screen pixels) that decide what a drawing means. One place, so the canvas, the
// tests and the layout read-back agree.

export interface DrawingOptions {
  /** Spacing of the resampled, smoothed paths. */
  readonly spacing: number;
  /** A stroke ending this close to a start closes (or joins) there. */
  readonly closeRadius: number;
  /** A stroke running on past its start by up to this much arc length is trimmed and closed. */
  readonly overshoot: number;
  /** Strands closer than this without a clean crossing are a degeneracy. */
  readonly tolerance: number;
  /** Strands crossing while closer than retraceWidth for retraceLength either side are a retrace. */
  readonly retraceWidth: number;
  readonly retraceLength: number;
  /** Two crossings closer than this (in the plane) are a degeneracy. */
  readonly minCrossingGap: number;
  /** Half-length of the gap cut into an under-strand, along the strand. */
  readonly gapRadius: number;
  /** A stored flip still applies to a crossing of the same strands within this distance. */
  readonly flipRadius: number;
  /** Half the width of a band: its sides run this far either side of its core. */
  readonly bandHalfWidth: number;
}

export const defaultOptions: DrawingOptions = {
  spacing: 3,
  closeRadius: 20,
  overshoot: 100,
  tolerance: 3,
  retraceWidth: 12,
  retraceLength: 45,
  minCrossingGap: 10,
  gapRadius: 5,
  flipRadius: 24,
  bandHalfWidth: 8,
};

export const withDefaults = (options: Partial<DrawingOptions> = {}): DrawingOptions => ({ ...defaultOptions, ...options });
