// A sketch's picture as the Slate draws it (lib/slate/picture.ts): each strand in its chalk
// colour, cut where it passes under, so a linked and an unlinked pair of circles look
// different; bands as translucent ribbons in the band colour. With `marks` (a sketch's own page) each component also shows its orientation
// arrow and a label "number: framing" ("bb" for the blackboard framing). Until a code has a
// picture, or when it has none, the box shows the crossing count.
import { useEffect, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { G, Path, Text as SvgText } from 'react-native-svg';
import type { Diagram as StoredDiagram } from '@/shared/api/sketches';
import { analyse } from '@/shared/drawing/analyse';
import { arrowHead } from '@/shared/drawing/pick';
import type { Point } from '@/shared/drawing/point';
import { fitView, strandPictures, type StrandPicture } from '@/lib/slate/picture';
import { bandPictures, type BandPicture } from '@/lib/slate/band-pictures';
import { docFromStored } from '@/lib/slate/record';
import { fonts, radius, slate } from '@/constants/theme';

export type PictureSource = Omit<StoredDiagram, 'strokes'>;

// Lists re-render on every store change with new objects: the pictures are kept per caller's
// key (a sketch id with its version), the last few hundred only.
type Pictures = { strands: StrandPicture[]; bands: BandPicture[] };
const cache = new Map<string, Pictures | null>();
const CACHE_SIZE = 300;

/** Room round the drawing; with marks, for the labels beside the arrows (lib/slate/picture.ts badgeOffset). */
const marginFor = (size: number, marks: boolean) => (marks ? Math.max(56, size * 0.12) : size * 0.12);

function picturesOf(d: PictureSource, size: number, margin: number): Pictures | null {
  try {
    const doc = docFromStored({ ...d, strokes: [] }); // lays out a typed code, as the Slate does
    const points = doc.sketch.components.flatMap((c) => c.points);
    if (points.length === 0) return null;
    const view = fitView(points, size, size, margin);
    return { strands: strandPictures(doc, analyse(doc.sketch), view), bands: bandPictures(doc.sketch, view) };
  } catch {
    return null; // a code the layout cannot draw
  }
}

/**
 * A code without a drawing is laid out (shared/layout), 0.1 to 0.6 s each here: one at a time,
 * each in its own task after the list has rendered, so a feed of typed codes stays responsive.
 * Past this many crossings the box keeps the crossing count.
 */
const LAYOUT_LIMIT = 40;
const layouts: (() => void)[] = [];
let layingOut = false;
function nextLayout() {
  const task = layouts.shift();
  layingOut = task !== undefined;
  if (task) setTimeout(() => (task(), nextLayout()), 0);
}

function compute(k: string, d: PictureSource, size: number, marks: boolean) {
  cache.set(k, picturesOf(d, size, marginFor(size, marks)));
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
}

/** The pictures for this key: at once from a drawing, later (undefined until then) from a code. */
function usePictures(key: string, d: PictureSource, size: number, marks: boolean): Pictures | null | undefined {
  const k = `${key}:${size}:${marks}`;
  const needsLayout = d.geometry == null && d.pd.length > 0;
  if (!cache.has(k) && needsLayout && d.pd.length > LAYOUT_LIMIT) cache.set(k, null);
  if (!cache.has(k) && !needsLayout) compute(k, d, size, marks);
  const [, laidOut] = useState(0);
  const ready = cache.has(k);
  useEffect(() => {
    if (ready) return;
    let live = true;
    layouts.push(() => {
      if (!cache.has(k)) compute(k, d, size, marks);
      if (live) laidOut((n) => n + 1);
    });
    if (!layingOut) nextLayout();
    return () => {
      live = false;
    };
  }, [k, ready, d, size, marks]);
  return cache.get(k);
}

const arrowPath = (at: Point, dir: Point): string =>
  arrowHead(at, dir, 8).map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ') + ' Z';

/** A component's "number: framing", over a halo of the slate so no strand is drawn through it. */
function Label({ at, text, colour }: { at: Point; text: string; colour: string }) {
  return (
    <G>
      {[slate.surface, colour].map((fill, i) => (
        <SvgText key={i} x={at.x} y={at.y + 4} fontSize={12} fontFamily={fonts.mono} textAnchor="middle" fill={fill}
          stroke={i === 0 ? slate.surface : undefined} strokeWidth={i === 0 ? 4 : undefined} strokeLinejoin="round">
          {text}
        </SvgText>
      ))}
    </G>
  );
}

export function DiagramPicture({ diagram, size, pictureKey, crossings, marks = false, label }: {
  diagram: PictureSource;
  size: number;
  /** Unique for this drawing (e.g. sketch id and version): pictures are computed once per key. */
  pictureKey: string;
  crossings: number;
  marks?: boolean;
  label: string;
}) {
  const pictures = usePictures(pictureKey, diagram, size, marks);
  const stroke = Math.max(1.6, size / 45);
  return (
    <View style={[styles.box, { width: size, height: size }]} aria-label={label} role="img">
      {pictures ? (
        <Svg width={size} height={size}>
          {pictures.strands.map((p) => (
            <G key={p.id}>
              {p.pieces.map((d, i) => (
                <Path key={i} d={d} stroke={p.colour} strokeWidth={stroke} strokeLinecap="round" strokeLinejoin="round" fill="none" strokeDasharray={p.closed ? undefined : '2 6'} />
              ))}
              {marks && p.arrow ? <Path d={arrowPath(p.arrow.at, p.arrow.direction)} fill={p.colour} stroke={slate.surface} strokeWidth={1.2} /> : null}
            </G>
          ))}
          {pictures.bands.flatMap((b) => b.pieces.map((d, i) => (
            <Path key={`${b.id}-${i}`} d={d} stroke={slate.band} strokeOpacity={0.4} strokeWidth={b.width} fill="none" />
          )))}
          {/* Labels last, so later strands never cover an earlier component's label. */}
          {marks ? pictures.strands.map((p) => (p.badge && p.number !== null
            ? <Label key={`label-${p.id}`} at={p.badge.at} text={`${p.number}: ${p.badge.text}`} colour={p.colour} />
            : null)) : null}
        </Svg>
      ) : (
        <Text style={styles.code}>{crossings} ×</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: slate.surface, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center', overflow: 'hidden' },
  code: { fontFamily: fonts.mono, fontSize: 13, color: slate.chalkDim },
});
