// A small slate tile with a chalk Hopf link and the eight chalk colours: the empty sketchbook's
// picture of what a sketch will look like.
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { chalk, slate } from '@/constants/theme';
import { hopfPaths } from './hopf';

const W = 168;
const H = 112;

export function SlateArt() {
  const [left, right] = hopfPaths(W / 2, 46, 26, 15, 0.32);
  return (
    <Svg width={W} height={H} viewBox={`0 0 ${W} ${H}`}>
      <Rect x={0} y={0} width={W} height={H} rx={14} fill={slate.surface} />
      <Path d={left} stroke={chalk[2]} strokeWidth={3.2} strokeLinecap="round" fill="none" />
      <Path d={right} stroke={chalk[1]} strokeWidth={3.2} strokeLinecap="round" fill="none" />
      {chalk.map((c, i) => (
        <Circle key={c} cx={W / 2 + (i - 3.5) * 15} cy={94} r={4.5} fill={c} />
      ))}
    </Svg>
  );
}
