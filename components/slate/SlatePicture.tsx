// What the Slate's board draws, in screen pixels: the grid, the strands with their gaps, open
// ends, arrows, framing badges and numbers, the selection's halo, the Flip tool's rings, the
// bands, the warning markers and the stroke being drawn.
import Svg, { Circle, G, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import type { Analysis } from '@/shared/drawing/analyse';
import type { Point } from '@/shared/drawing/point';
import type { SlateDoc } from '@/lib/slate/record';
import { HIT } from '@/lib/slate/drag-actions';
import { badgePill, screenSizes, toScreen, type StrandPicture } from '@/lib/slate/picture';
import type { Tool, View } from '@/lib/slate/slate-store';
import { fonts, slate } from '@/constants/theme';
import { BandLayer } from './BandLayer';

interface Props {
  size: { width: number; height: number };
  view: View;
  doc: SlateDoc;
  analysis: Analysis;
  pictures: StrandPicture[];
  tool: Tool;
  selected: string | null;
  selectedBand: string | null;
  /** The stroke being drawn, in world units. */
  live: Point[] | null;
}

const pathOf = (pts: readonly Point[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ');

export function SlatePicture({ size, view, doc, analysis, pictures, tool, selected, selectedBand, live }: Props) {
  const selectedPicture = pictures.find((p) => p.id === selected);
  return (
    <Svg width={size.width} height={size.height}>
      <Rect x={0} y={0} width={size.width} height={size.height} fill={slate.surface} />
      <Grid width={size.width} height={size.height} view={view} />
      {selectedPicture ? selectedPicture.pieces.map((d, i) => (
        <Path key={`sel${i}`} d={d} stroke={selectedPicture.colour} strokeOpacity={0.22} strokeWidth={screenSizes.stroke + 10} strokeLinecap="round" strokeLinejoin="round" fill="none" />
      )) : null}
      {pictures.map((p) => <Strand key={p.id} p={p} />)}
      {tool === 'flip' ? analysis.crossings.map((c, i) => {
        const at = toScreen(view, c.at);
        return <Circle key={`x${i}`} cx={at.x} cy={at.y} r={HIT - 4} stroke={slate.chalkDim} strokeDasharray="3 4" strokeWidth={1.2} fill="none" />;
      }) : null}
      <BandLayer sketch={doc.sketch} view={view} active={tool === 'bands'} selected={selectedBand} />
      {analysis.markers.map((m, i) => {
        const at = toScreen(view, m.at);
        return (
          <G key={`m${i}`}>
            <Circle cx={at.x} cy={at.y} r={16} stroke={slate.warn} strokeWidth={2.4} fill={slate.warnFill} />
            <SvgText x={at.x} y={at.y + 5} fontSize={15} fontFamily={fonts.semibold} fill={slate.warnText} textAnchor="middle">!</SvgText>
          </G>
        );
      })}
      {live && live.length > 1 ? <Path d={pathOf(live.map((p) => toScreen(view, p)))} stroke={tool === 'bands' ? slate.band : slate.chalkDim} strokeWidth={screenSizes.stroke} strokeLinecap="round" strokeLinejoin="round" fill="none" /> : null}
    </Svg>
  );
}

/** One component: its visible pieces (dashed while open), open ends, arrow, framing badge, number. */
function Strand({ p }: { p: StrandPicture }) {
  return (
    <G>
      {p.pieces.map((d, i) => (
        <Path key={i} d={d} stroke={p.colour} strokeWidth={screenSizes.stroke} strokeLinecap="round" strokeLinejoin="round" fill="none"
          strokeDasharray={p.closed ? undefined : '2 7'} />
      ))}
      {p.ends.map((e, i) => <Circle key={`e${i}`} cx={e.x} cy={e.y} r={5} stroke={p.colour} strokeWidth={2} fill={slate.surface} />)}
      {p.arrow ? <Arrow at={p.arrow.at} direction={p.arrow.direction} colour={p.colour} /> : null}
      {p.badge ? (
        <G>
          <Rect x={p.badge.at.x - badgePill.width / 2} y={p.badge.at.y - badgePill.height / 2} width={badgePill.width} height={badgePill.height} rx={badgePill.height / 2} fill={slate.raised} stroke={p.colour} strokeWidth={1} strokeOpacity={p.badge.blackboard ? 0.5 : 1} />
          <SvgText x={p.badge.at.x} y={p.badge.at.y + 4} fontSize={11} fontFamily={fonts.mono} fill={p.badge.blackboard ? slate.chalkDim : p.colour} textAnchor="middle">{p.badge.text}</SvgText>
        </G>
      ) : null}
      {p.label ? (
        <G aria-label={`Component ${p.label.text}`}>
          <Circle cx={p.label.at.x} cy={p.label.at.y} r={8} fill={slate.surface} fillOpacity={0.85} />
          <SvgText x={p.label.at.x} y={p.label.at.y + 4} fontSize={12} fontFamily={fonts.semibold} fill={p.colour} textAnchor="middle">{p.label.text}</SvgText>
        </G>
      ) : null}
    </G>
  );
}

function Arrow({ at, direction, colour }: { at: Point; direction: Point; colour: string }) {
  const [dx, dy] = [direction.x, direction.y];
  const tip = { x: at.x + dx * 9, y: at.y + dy * 9 };
  const l = { x: at.x - dx * 5 - dy * 7, y: at.y - dy * 5 + dx * 7 };
  const r = { x: at.x - dx * 5 + dy * 7, y: at.y - dy * 5 - dx * 7 };
  return <Polygon points={`${tip.x},${tip.y} ${l.x},${l.y} ${r.x},${r.y}`} fill={colour} stroke={slate.surface} strokeWidth={1.5} />;
}

/** Faint dots every 40 world units, so zoom and pan can be seen. */
function Grid({ width, height, view }: { width: number; height: number; view: View }) {
  const step = 40 * view.k;
  if (step < 14 || width === 0) return null;
  const dots: string[] = [];
  for (let x = ((view.x % step) + step) % step; x < width; x += step) {
    for (let y = ((view.y % step) + step) % step; y < height; y += step) dots.push(`M${x.toFixed(1)} ${y.toFixed(1)}h0.01`);
  }
  return <Path d={dots.join('')} stroke={slate.grid} strokeWidth={2.2} strokeLinecap="round" />;
}
