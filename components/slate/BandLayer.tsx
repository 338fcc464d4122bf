// The bands on the Slate: each a translucent ribbon along its core in the band colour, cut
// where it passes under a strand, with its number (and half twists) in a badge; with the Bands
// tool, its crossings with strands are ringed as tap targets. A band that cannot be read as
// drawn (too short, no room for its twists) is drawn dashed in the refusal colour.
import { useMemo } from 'react';
import { Circle, G, Path, Rect, Text as SvgText } from 'react-native-svg';
import type { Sketch } from '@/shared/drawing/sketch';
import { bandPictures } from '@/lib/slate/band-pictures';
import type { View } from '@/lib/slate/slate-store';
import { fonts, slate } from '@/constants/theme';

export function BandLayer({ sketch, view, active, selected }: { sketch: Sketch; view: View; active: boolean; selected: string | null }) {
  const pictures = useMemo(() => bandPictures(sketch, view), [sketch, view]);
  return (
    <G>
      {pictures.map((p) => {
        const colour = p.problem ? slate.warn : slate.band;
        const w = p.text.length * 7 + 14;
        return (
          <G key={p.id} aria-label={`Band ${p.number}`}>
            {p.pieces.map((d, i) => (
              <G key={i}>
                <Path d={d} stroke={colour} strokeOpacity={p.id === selected ? 0.5 : 0.3} strokeWidth={p.width} strokeLinecap="butt" strokeLinejoin="round" fill="none" />
                <Path d={d} stroke={colour} strokeWidth={1.4} strokeDasharray={p.problem ? '4 4' : undefined} fill="none" />
              </G>
            ))}
            {active ? p.crossings.map((c, i) => (
              <Circle key={`x${i}`} cx={c.at.x} cy={c.at.y} r={14} stroke={colour} strokeDasharray="3 4" strokeWidth={1.2} fill="none" />
            )) : null}
            <Rect x={p.badge.at.x - w / 2} y={p.badge.at.y - 11} width={w} height={22} rx={11} fill={slate.raised} stroke={colour} strokeWidth={p.id === selected ? 2 : 1} />
            <SvgText x={p.badge.at.x} y={p.badge.at.y + 4} fontSize={12} fontFamily={fonts.semibold} fill={colour} textAnchor="middle">{p.text}</SvgText>
          </G>
        );
      })}
    </G>
  );
}
