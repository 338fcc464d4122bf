// Line icons drawn for Overstrand (no icon font to ship). 24-unit grid, 1.75 stroke.
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { chalk, slate } from '@/constants/theme';
import { hopfPaths } from './hopf';

type IconProps = { color: string; size?: number };

function Frame({ size = 24, children }: { size?: number; children: React.ReactNode }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      {children}
    </Svg>
  );
}

/** A figure-eight curve crossing itself once, broken where it passes under: a sketch. */
export function SketchesIcon({ color, size }: IconProps) {
  return (
    <Frame size={size}>
      <Path
        d="M13.4 10.3 C 15 7.6, 20.5 7.4, 20.5 12 C 20.5 16.6, 15 16.4, 12 12 C 9 7.6, 3.5 7.4, 3.5 12 C 3.5 16.6, 9 16.4, 10.6 13.7"
        stroke={color} strokeWidth={1.75} strokeLinecap="round" />
    </Frame>
  );
}

export function FeedIcon({ color, size }: IconProps) {
  return (
    <Frame size={size}>
      <Rect x={4} y={4} width={16} height={7} rx={2} stroke={color} strokeWidth={1.75} />
      <Path d="M4 15.5 H20 M4 19.5 H14" stroke={color} strokeWidth={1.75} strokeLinecap="round" />
    </Frame>
  );
}

export function RunsIcon({ color, size }: IconProps) {
  return (
    <Frame size={size}>
      <Path d="M4 20 V13 M9.3 20 V8 M14.6 20 V11 M20 20 V4" stroke={color} strokeWidth={1.75} strokeLinecap="round" />
    </Frame>
  );
}

export function AccountIcon({ color, size }: IconProps) {
  return (
    <Frame size={size}>
      <Circle cx={12} cy={8.5} r={3.75} stroke={color} strokeWidth={1.75} />
      <Path d="M4.5 20 C 5.5 15.8, 8.4 14, 12 14 C 15.6 14, 18.5 15.8, 19.5 20" stroke={color} strokeWidth={1.75} strokeLinecap="round" />
    </Frame>
  );
}

/** The mark: the Hopf link in chalk on a slate tile. */
export function Mark({ size = 36 }: { size?: number }) {
  const [left, right] = hopfPaths(18, 18, 8.4, 4.6, 0.42);
  return (
    <Svg width={size} height={size} viewBox="0 0 36 36" fill="none">
      <Rect x={0} y={0} width={36} height={36} rx={9} fill={slate.surface} />
      <Path d={left} stroke={chalk[2]} strokeWidth={2.6} strokeLinecap="round" />
      <Path d={right} stroke={chalk[1]} strokeWidth={2.6} strokeLinecap="round" />
    </Svg>
  );
}
