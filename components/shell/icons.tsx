// Line icons drawn for Overstrand (no icon font to ship). 24-unit grid, 1.75 stroke.
import Svg, { Circle, Path, Rect } from 'react-native-svg';

type IconProps = { color: string; size?: number };

function Frame({ size = 24, children }: { size?: number; children: React.ReactNode }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" fill="none">
      {children}
    </Svg>
  );
}

/** A strand crossing itself once: a kink, the smallest sketch. The gap marks the under-strand. */
export function SketchesIcon({ color, size }: IconProps) {
  return (
    <Frame size={size}>
      <Path d="M3 19 C 9 19, 17 14, 17 8.5 A 4.5 4.5 0 0 0 8 8.5 C 8 11, 9.5 13, 11 14.2" stroke={color} strokeWidth={1.75} strokeLinecap="round" />
      <Path d="M13.6 15.8 C 15.5 17.4, 18 19, 21 19" stroke={color} strokeWidth={1.75} strokeLinecap="round" />
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

/** The mark: two chalk strands of the Hopf link, one over, one under. */
export function Mark({ size = 28, colors }: { size?: number; colors: readonly [string, string] }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 28 28" fill="none">
      <Path d="M17.2 8.4 A 6.5 6.5 0 1 0 17.2 19.6" stroke={colors[0]} strokeWidth={2.6} strokeLinecap="round" />
      <Path d="M10.8 8.4 A 6.5 6.5 0 1 1 10.8 19.6" stroke={colors[1]} strokeWidth={2.6} strokeLinecap="round" />
    </Svg>
  );
}
