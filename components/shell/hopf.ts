// Two chalk circles linked once (the Hopf link), drawn the way link diagrams are: each strand
// is broken where it passes under the other. Used by the mark and the empty-sketchbook art.

/** A circle of radius r around (cx, cy) broken by `gap` radians around `angle` (SVG: y down). */
function brokenCircle(cx: number, cy: number, r: number, angle: number, gap: number): string {
  const at = (a: number) => `${(cx + r * Math.cos(a)).toFixed(2)} ${(cy + r * Math.sin(a)).toFixed(2)}`;
  return `M ${at(angle + gap)} A ${r} ${r} 0 1 1 ${at(angle - gap)}`;
}

/** Paths of the two circles (centres 2d apart around (cx, cy)); the left one is under at the bottom. */
export function hopfPaths(cx: number, cy: number, r: number, d: number, gap: number): [string, string] {
  const meet = Math.acos(d / r); // angle from a centre to the two crossing points
  return [brokenCircle(cx - d, cy, r, meet, gap), brokenCircle(cx + d, cy, r, Math.PI + meet, gap)];
}
