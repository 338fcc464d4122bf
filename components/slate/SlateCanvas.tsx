// The Slate: a dark board where a finger or a mouse draws chalk strands. One-finger pan draws
// (or moves / reshapes / pans, by tool); a tap flips a crossing, reverses at an arrow, opens a
// framing badge or selects a strand; pinch and two-finger pan zoom and pan; on web the wheel
// zooms. Drags only change the preview; lifting the finger commits one undo step.
import { useEffect, useMemo, useRef, useState } from 'react';
import { Platform, StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { Gesture, GestureDetector } from 'react-native-gesture-handler';
import Svg, { Circle, G, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import type { Analysis } from '@/shared/drawing/analyse';
import { componentNear, crossingNear } from '@/shared/drawing/pick';
import { dist, type Point } from '@/shared/drawing/point';
import { addStroke, flipCrossing, moveComponent, reshapeComponent, reverseComponent } from '@/shared/drawing/sketch';
import type { SlateDoc } from '@/lib/slate/record';
import { carryThroughDrag, finishBand, tapBand } from '@/lib/slate/band-actions';
import { fitView, screenSizes, strandPictures, toScreen, toWorld, zoomAbout } from '@/lib/slate/picture';
import { currentDoc, useSlate, type View as ViewT } from '@/lib/slate/slate-store';
import { fonts, slate } from '@/constants/theme';
import { BandLayer } from './BandLayer';

type Drag =
  | { kind: 'draw' | 'band'; points: Point[] }
  | { kind: 'move' | 'reshape'; id: string; index: number; origin: Point; from: SlateDoc }
  | { kind: 'pan'; origin: Point; from: ViewT };

/** Hit radii of taps, in screen pixels: on a strand or crossing; on the framing badge (a 44 px target); on the arrow. */
const HIT = 18;
const BADGE_HIT = 22;
const ARROW_HIT = 14;
/** How far along the strand a reshaping drag reaches, in screen pixels. */
const reshapeRadius = 60;

const pathOf = (pts: readonly Point[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ');

export function SlateCanvas({ analysis, onFraming }: { analysis: Analysis; onFraming: (id: string) => void }) {
  const doc = useSlate(currentDoc);
  const view = useSlate((s) => s.view);
  const selected = useSlate((s) => s.selected);
  const tool = useSlate((s) => s.tool);
  const fitRequest = useSlate((s) => s.fitRequest);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [live, setLive] = useState<Point[] | null>(null);
  const drag = useRef<Drag | null>(null);
  /** Where the last finger went down, in canvas pixels. */
  const downAt = useRef<Point | null>(null);
  // The gesture handlers are made once; they read the latest values through this ref.
  const latest = useRef({ analysis, doc, onFraming });
  latest.current = { analysis, doc, onFraming };
  const pictures = useMemo(() => strandPictures(doc, analysis, view), [doc, analysis, view]);
  const picturesRef = useRef(pictures);
  picturesRef.current = pictures;

  // A document from outside (opened, pasted, built) is fitted into the board once it has a size.
  useEffect(() => {
    const s = useSlate.getState();
    if (size.width === 0 || s.fitted === fitRequest) return;
    const points = s.history.present.sketch.components.flatMap((c) => c.points);
    s.markFitted(fitRequest, points.length ? fitView(points, size.width, size.height) : s.view);
  }, [fitRequest, size]);

  const begin = (screen: Point) => {
    const s = useSlate.getState();
    const p = toWorld(s.view, screen);
    if (s.tool === 'draw' || s.tool === 'bands') {
      drag.current = { kind: s.tool === 'draw' ? 'draw' : 'band', points: [p] };
      return;
    }
    const hit = s.tool === 'flip' ? null : componentNear(latest.current.analysis, p, HIT / s.view.k);
    if (hit && (s.tool === 'reshape' || s.tool === 'move')) {
      drag.current = { kind: s.tool, id: hit.id, index: hit.index, origin: p, from: latest.current.doc };
      s.select(hit.id);
    } else {
      drag.current = { kind: 'pan', origin: screen, from: s.view };
    }
  };

  const update = (screen: Point) => {
    const d = drag.current;
    const s = useSlate.getState();
    if (!d) return;
    if ('points' in d) {
      d.points.push(toWorld(s.view, screen));
      setLive([...d.points]);
    } else if (d.kind === 'pan') {
      s.setView({ ...d.from, x: d.from.x + screen.x - d.origin.x, y: d.from.y + screen.y - d.origin.y });
    } else {
      const p = toWorld(s.view, screen);
      const delta = { x: p.x - d.origin.x, y: p.y - d.origin.y };
      const edited = d.kind === 'move'
        ? moveComponent(d.from.sketch, d.id, delta)
        : reshapeComponent(d.from.sketch, d.id, d.index, delta, reshapeRadius / s.view.k);
      // Flips and bands are anchored by position; a drag carries them (or removes bands, saying why).
      const sketch = carryThroughDrag(d.from.sketch, edited);
      s.setPreview({ ...d.from, sketch });
    }
  };

  const end = () => {
    const d = drag.current;
    drag.current = null;
    const s = useSlate.getState();
    if (!d) return;
    if (d.kind === 'draw') {
      setLive(null);
      const doc = s.history.present;
      const next = addStroke(doc.sketch, d.points);
      if (next !== doc.sketch) s.apply({ ...doc, sketch: next });
    } else if (d.kind === 'band') {
      setLive(null);
      finishBand(d.points);
    } else if (d.kind !== 'pan') {
      if (s.preview) s.apply(s.preview);
    }
  };

  const tap = (screen: Point) => {
    const s = useSlate.getState();
    const { analysis: a, doc } = latest.current;
    const badge = picturesRef.current.find((p) => p.badge && dist(p.badge.at, screen) <= BADGE_HIT);
    if (badge) return latest.current.onFraming(badge.id);
    const arrow = picturesRef.current.find((p) => p.arrow && dist(p.arrow.at, screen) <= ARROW_HIT);
    if (arrow) return s.apply({ ...doc, sketch: reverseComponent(doc.sketch, arrow.id) });
    if (s.tool === 'bands' && tapBand(screen)) return;
    const p = toWorld(s.view, screen);
    const x = crossingNear(a, p, HIT / s.view.k);
    if (x !== null) {
      const c = a.crossings[x];
      return s.apply({ ...doc, sketch: flipCrossing(doc.sketch, { a: c.over, b: c.under, at: c.at }) });
    }
    const hit = componentNear(a, p, HIT / s.view.k);
    s.select(hit && hit.id !== s.selected ? hit.id : null);
  };

  const gesture = useMemo(() => {
    const pinchFrom = { view: useSlate.getState().view, scale: 1, focal: { x: 0, y: 0 }, shift: { x: 0, y: 0 } };
    const applyPinch = () => {
      const v = zoomAbout(pinchFrom.view, pinchFrom.scale, pinchFrom.focal);
      useSlate.getState().setView({ ...v, x: v.x + pinchFrom.shift.x, y: v.y + pinchFrom.shift.y });
    };
    // The stroke starts where the finger went down, not at the first move, which a quick stroke
    // makes tens of pixels later; and it ends where the finger lifted. On the web the handler
    // reports the down point late, so the surface's own pointerdown records it (below).
    const one = Gesture.Pan().runOnJS(true).maxPointers(1).minDistance(2)
      .onBegin((e) => {
        if (Platform.OS !== 'web') downAt.current = { x: e.x, y: e.y };
      })
      .onStart((e) => {
        begin(downAt.current ?? { x: e.x - e.translationX, y: e.y - e.translationY });
        update({ x: e.x, y: e.y });
      })
      .onUpdate((e) => update({ x: e.x, y: e.y }))
      .onEnd((e) => {
        update({ x: e.x, y: e.y });
        end();
      })
      .onFinalize(() => {
        if (drag.current) end();
      });
    const tapG = Gesture.Tap().runOnJS(true).maxDistance(6).onEnd((e, ok) => ok && tap({ x: e.x, y: e.y }));
    const pinch = Gesture.Pinch().runOnJS(true)
      .onStart((e) => Object.assign(pinchFrom, { view: useSlate.getState().view, scale: 1, focal: { x: e.focalX, y: e.focalY }, shift: { x: 0, y: 0 } }))
      .onUpdate((e) => {
        pinchFrom.scale = e.scale;
        applyPinch();
      });
    const two = Gesture.Pan().runOnJS(true).minPointers(2)
      .onUpdate((e) => {
        pinchFrom.shift = { x: e.translationX, y: e.translationY };
        applyPinch();
      });
    return Gesture.Race(Gesture.Simultaneous(pinch, two), one, tapG);
    // The handlers read the store and refs, so one gesture object serves every render.
  }, []);

  // Web: the wheel zooms about the pointer; a pointer going down is where a stroke starts.
  const surface = useRef<View>(null);
  useEffect(() => {
    if (Platform.OS !== 'web' || !surface.current) return;
    const node = surface.current as unknown as HTMLElement;
    const onDown = (e: PointerEvent) => {
      const r = node.getBoundingClientRect();
      downAt.current = { x: e.clientX - r.left, y: e.clientY - r.top };
    };
    node.addEventListener('pointerdown', onDown, true);
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = node.getBoundingClientRect();
      const s = useSlate.getState();
      s.setView(zoomAbout(s.view, Math.exp(-e.deltaY / 400), { x: e.clientX - r.left, y: e.clientY - r.top }));
    };
    node.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      node.removeEventListener('wheel', onWheel);
      node.removeEventListener('pointerdown', onDown, true);
    };
  }, []);

  const onLayout = (e: LayoutChangeEvent) => {
    const { width, height } = e.nativeEvent.layout;
    useSlate.getState().resize(width, height);
    setSize({ width, height });
  };
  const selectedPicture = pictures.find((p) => p.id === selected);
  const selectedBand = useSlate((s) => s.selectedBand);
  const empty = doc.sketch.components.length === 0 && !live;

  return (
    <GestureDetector gesture={gesture}>
      <View ref={surface} collapsable={false} style={styles.surface} onLayout={onLayout} testID="slate-canvas" aria-label="Slate: drawing canvas">
        <Svg width={size.width} height={size.height}>
          <Rect x={0} y={0} width={size.width} height={size.height} fill={slate.surface} />
          <Grid width={size.width} height={size.height} view={view} />
          {selectedPicture ? selectedPicture.pieces.map((d, i) => (
            <Path key={`sel${i}`} d={d} stroke={selectedPicture.colour} strokeOpacity={0.22} strokeWidth={screenSizes.stroke + 10} strokeLinecap="round" strokeLinejoin="round" fill="none" />
          )) : null}
          {pictures.map((p) => (
            <G key={p.id}>
              {p.pieces.map((d, i) => (
                <Path key={i} d={d} stroke={p.colour} strokeWidth={screenSizes.stroke} strokeLinecap="round" strokeLinejoin="round" fill="none"
                  strokeDasharray={p.closed ? undefined : '2 7'} />
              ))}
              {p.ends.map((e, i) => <Circle key={`e${i}`} cx={e.x} cy={e.y} r={5} stroke={p.colour} strokeWidth={2} fill={slate.surface} />)}
              {p.arrow ? <Arrow at={p.arrow.at} direction={p.arrow.direction} colour={p.colour} /> : null}
              {p.badge ? (
                <G>
                  <Rect x={p.badge.at.x - 15} y={p.badge.at.y - 10} width={30} height={20} rx={10} fill={slate.raised} stroke={p.colour} strokeWidth={1} strokeOpacity={p.badge.blackboard ? 0.5 : 1} />
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
          ))}
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
        {empty ? (
          <View pointerEvents="none" style={styles.hintBox}>
            <Text style={styles.hint}>Draw a strand. End it where it began to close it.</Text>
          </View>
        ) : null}
      </View>
    </GestureDetector>
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
function Grid({ width, height, view }: { width: number; height: number; view: ViewT }) {
  const step = 40 * view.k;
  if (step < 14 || width === 0) return null;
  const dots: string[] = [];
  for (let x = ((view.x % step) + step) % step; x < width; x += step) {
    for (let y = ((view.y % step) + step) % step; y < height; y += step) dots.push(`M${x.toFixed(1)} ${y.toFixed(1)}h0.01`);
  }
  return <Path d={dots.join('')} stroke={slate.grid} strokeWidth={2.2} strokeLinecap="round" />;
}

const styles = StyleSheet.create({
  surface: { flex: 1, backgroundColor: slate.surface, overflow: 'hidden' },
  hintBox: { position: 'absolute', left: 0, right: 0, top: 0, bottom: 0, alignItems: 'center', justifyContent: 'center', padding: 24 },
  hint: { fontFamily: fonts.regular, fontSize: 16, color: slate.chalkDim, textAlign: 'center' },
});
