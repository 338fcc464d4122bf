// A small slate tile with a chalk Hopf link and the eight chalk colours: the empty sketchbook's
// picture of what a sketch will look like.
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { chalk, slate } from '@/constants/theme';

const W = 168;
const H = 112;
const R = 26;
const D = 15; // half the distance between the two centres
const GAP = 0.32; // half-width (radians) of the break where a strand passes under

/** A circle of radius R around (cx, cy), broken around `angle` (SVG angles, y pointing down). */
function brokenCircle(cx: number, cy: number, angle: number): string {
  const at = (a: number) => `${(cx + R * Math.cos(a)).toFixed(2)} ${(cy + R * Math.sin(a)).toFixed(2)}`;
  return `M ${at(angle + GAP)} A ${R} ${R} 0 1 1 ${at(angle - GAP)}`;
}

export function SlateArt() {
  const cy = 46;
  const left = W / 2 - D;
  const right = W / 2 + D;
  const meet = Math.acos(D / R); // angle from a centre to the two crossing points
  return (
    <Svg width={W} height={H} viewBox={`0 0 ${W} ${H}`}>
      <Rect x={0} y={0} width={W} height={H} rx={14} fill={slate.surface} />
      {/* left strand passes under at the lower crossing, the right one under at the upper */}
      <Path d={brokenCircle(left, cy, meet)} stroke={chalk[2]} strokeWidth={3.2} strokeLinecap="round" fill="none" />
      <Path d={brokenCircle(right, cy, Math.PI + meet)} stroke={chalk[1]} strokeWidth={3.2} strokeLinecap="round" fill="none" />
      {chalk.map((c, i) => (
        <Circle key={c} cx={W / 2 + (i - 3.5) * 15} cy={94} r={4.5} fill={c} />
      ))}
    </Svg>
  );
}
