// Plane geometry on screen coordinates: x to the right, y DOWN (as touch events report them).
// Because y points down, a positive cross(u, v) means v is turned CLOCKWISE from u as the viewer
// sees the screen; every "counterclockwise" in this folder means as the viewer sees it.

export interface Point {
  readonly x: number;
  readonly y: number;
}

export const pt = (x: number, y: number): Point => ({ x, y });
export const add = (p: Point, q: Point): Point => ({ x: p.x + q.x, y: p.y + q.y });
export const sub = (p: Point, q: Point): Point => ({ x: p.x - q.x, y: p.y - q.y });
export const scale = (p: Point, k: number): Point => ({ x: p.x * k, y: p.y * k });
export const lerp = (p: Point, q: Point, t: number): Point => ({ x: p.x + (q.x - p.x) * t, y: p.y + (q.y - p.y) * t });
export const dot = (p: Point, q: Point): number => p.x * q.x + p.y * q.y;
export const cross = (p: Point, q: Point): number => p.x * q.y - p.y * q.x;
export const dist = (p: Point, q: Point): number => Math.hypot(p.x - q.x, p.y - q.y);
