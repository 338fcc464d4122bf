// The Slate's gestures: one finger drags or taps (lib/slate/drag-actions.ts), pinch and
// two-finger pan zoom and pan (lib/slate/zoom.ts); on the web the wheel zooms about the pointer.
import { useEffect, useMemo, useRef, useState, type RefObject } from 'react';
import { Platform, type View } from 'react-native';
import { Gesture } from 'react-native-gesture-handler';
import type { Point } from '@/shared/drawing/point';
import { dragTo, endDrag, startDrag, tapAt, type CanvasNow, type Drag } from '@/lib/slate/drag-actions';
import { useSlate } from '@/lib/slate/slate-store';
import { pinchedView, wheelView, type Pinch } from '@/lib/slate/zoom';

/** The gesture for the canvas, the ref its surface view takes, and the stroke being drawn. */
export function useSlateGestures(now: CanvasNow) {
  const [live, setLive] = useState<Point[] | null>(null);
  // The gesture handlers are made once; they read the latest values through this ref.
  const latest = useRef(now);
  latest.current = now;
  /** Where the last finger went down, in canvas pixels. */
  const downAt = useRef<Point | null>(null);
  const surface = useRef<View>(null);
  const gesture = useMemo(() => slateGesture(latest, downAt, setLive), []);
  useWebPointer(surface, downAt);
  return { gesture, surface, live };
}

function slateGesture(latest: RefObject<CanvasNow>, downAt: RefObject<Point | null>, setLive: (p: Point[] | null) => void) {
  let drag: Drag | null = null;
  const follow = (screen: Point) => {
    const points = drag && dragTo(drag, screen);
    if (points) setLive(points);
  };
  const finish = () => {
    const d = drag;
    drag = null;
    setLive(null);
    if (d) endDrag(d);
  };
  // The stroke starts where the finger went down, not at the first move, which a quick stroke
  // makes tens of pixels later; and it ends where the finger lifted. On the web the handler
  // reports the down point late, so the surface's own pointerdown records it (useWebPointer).
  const one = Gesture.Pan().runOnJS(true).maxPointers(1).minDistance(2)
    .onBegin((e) => {
      if (Platform.OS !== 'web') downAt.current = { x: e.x, y: e.y };
    })
    .onStart((e) => {
      drag = startDrag(downAt.current ?? { x: e.x - e.translationX, y: e.y - e.translationY }, latest.current);
      follow({ x: e.x, y: e.y });
    })
    .onUpdate((e) => follow({ x: e.x, y: e.y }))
    .onEnd((e) => {
      follow({ x: e.x, y: e.y });
      finish();
    })
    .onFinalize(() => {
      if (drag) finish();
    });
  const tap = Gesture.Tap().runOnJS(true).maxDistance(6).onEnd((e, ok) => ok && tapAt({ x: e.x, y: e.y }, latest.current));
  const pinch: Pinch = { from: useSlate.getState().view, scale: 1, focal: { x: 0, y: 0 }, shift: { x: 0, y: 0 } };
  const applyPinch = () => useSlate.getState().setView(pinchedView(pinch));
  const zoom = Gesture.Pinch().runOnJS(true)
    .onStart((e) => Object.assign(pinch, { from: useSlate.getState().view, scale: 1, focal: { x: e.focalX, y: e.focalY }, shift: { x: 0, y: 0 } }))
    .onUpdate((e) => {
      pinch.scale = e.scale;
      applyPinch();
    });
  const two = Gesture.Pan().runOnJS(true).minPointers(2)
    .onUpdate((e) => {
      pinch.shift = { x: e.translationX, y: e.translationY };
      applyPinch();
    });
  return Gesture.Race(Gesture.Simultaneous(zoom, two), one, tap);
}

/** Web: the wheel zooms about the pointer; a pointer going down is where a stroke starts. */
function useWebPointer(surface: RefObject<View | null>, downAt: RefObject<Point | null>) {
  useEffect(() => {
    if (Platform.OS !== 'web' || !surface.current) return;
    const node = surface.current as unknown as HTMLElement;
    const at = (e: MouseEvent): Point => {
      const r = node.getBoundingClientRect();
      return { x: e.clientX - r.left, y: e.clientY - r.top };
    };
    const onDown = (e: PointerEvent) => {
      downAt.current = at(e);
    };
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const s = useSlate.getState();
      s.setView(wheelView(s.view, e.deltaY, at(e)));
    };
    node.addEventListener('pointerdown', onDown, true);
    node.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      node.removeEventListener('wheel', onWheel);
      node.removeEventListener('pointerdown', onDown, true);
    };
  }, [surface, downAt]);
}
