// What every bench module reports, and the summaries they time with.

/** One figure: `npm run bench` prints it as "name: value unit (goal ...)". */
export interface Line {
  name: string;
  value: number;
  unit: string;
  goal?: string;
}

/** The middle of the sorted times (the upper one of an even count): robust to a stray slow run. */
export const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Two decimals, enough for milliseconds. */
export const round = (x: number): number => Math.round(x * 100) / 100;
