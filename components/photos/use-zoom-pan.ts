"use client";
// Zoom and pan for one image with a mouse, a trackpad or fingers: click or tap toggles zoom at that
// point, the wheel zooms around the cursor, two fingers pinch, one finger pans a zoomed image, and
// a sideways swipe on an unzoomed image asks for the next or previous photo.
import { useCallback, useEffect, useRef, useState, type PointerEvent as ReactPointerEvent } from "react";

export const MAX_SCALE = 6;
const CLICK_SCALE = 2.5;
const SWIPE_PX = 60;
const TAP_PX = 6;

type View = { scale: number; x: number; y: number };
type Point = { x: number; y: number };
const ORIGIN: View = { scale: 1, x: 0, y: 0 };

const distance = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y);

export function useZoomPan(onSwipe?: (direction: 1 | -1) => void) {
  const ref = useRef<HTMLDivElement | null>(null);
  const [view, setView] = useState<View>(ORIGIN);
  const viewRef = useRef(view);
  viewRef.current = view;
  const pointers = useRef(new Map<number, Point>());
  const gesture = useRef<{ start: Point; startView: View; moved: boolean; pinch?: { dist: number; view: View } } | null>(null);

  const clamp = useCallback((v: View): View => {
    const el = ref.current;
    const scale = Math.min(MAX_SCALE, Math.max(1, v.scale));
    if (scale === 1) return ORIGIN;
    if (!el) return { scale, x: v.x, y: v.y };
    const maxX = ((scale - 1) * el.clientWidth) / 2;
    const maxY = ((scale - 1) * el.clientHeight) / 2;
    return { scale, x: Math.max(-maxX, Math.min(maxX, v.x)), y: Math.max(-maxY, Math.min(maxY, v.y)) };
  }, []);

  /** New scale with the point under (clientX, clientY) staying put. */
  const zoomAt = useCallback(
    (clientX: number, clientY: number, scale: number, from: View = viewRef.current) => {
      const el = ref.current;
      if (!el) return;
      const r = el.getBoundingClientRect();
      const px = clientX - (r.left + r.width / 2);
      const py = clientY - (r.top + r.height / 2);
      const s = Math.min(MAX_SCALE, Math.max(1, scale));
      const k = s / from.scale;
      setView(clamp({ scale: s, x: px - (px - from.x) * k, y: py - (py - from.y) * k }));
    },
    [clamp],
  );

  const reset = useCallback(() => setView(ORIGIN), []);
  const zoomBy = useCallback(
    (factor: number) => {
      const r = ref.current?.getBoundingClientRect();
      if (r) zoomAt(r.left + r.width / 2, r.top + r.height / 2, viewRef.current.scale * factor);
    },
    [zoomAt],
  );

  // A wheel listener must be non-passive to keep the page from scrolling behind the photo.
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      zoomAt(e.clientX, e.clientY, viewRef.current.scale * Math.exp(-e.deltaY * 0.0025));
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, [zoomAt]);

  const onPointerDown = (e: ReactPointerEvent) => {
    (e.currentTarget as HTMLElement).setPointerCapture(e.pointerId);
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    const pts = [...pointers.current.values()];
    if (pts.length === 2) {
      gesture.current = {
        start: pts[0],
        startView: viewRef.current,
        moved: true,
        pinch: { dist: distance(pts[0], pts[1]), view: viewRef.current },
      };
    } else if (pts.length === 1) {
      gesture.current = { start: { x: e.clientX, y: e.clientY }, startView: viewRef.current, moved: false };
    }
  };

  const onPointerMove = (e: ReactPointerEvent) => {
    if (!pointers.current.has(e.pointerId) || !gesture.current) return;
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    const g = gesture.current;
    const pts = [...pointers.current.values()];
    if (g.pinch && pts.length >= 2) {
      const mid = { x: (pts[0].x + pts[1].x) / 2, y: (pts[0].y + pts[1].y) / 2 };
      zoomAt(mid.x, mid.y, (g.pinch.view.scale * distance(pts[0], pts[1])) / g.pinch.dist, g.pinch.view);
      return;
    }
    const dx = e.clientX - g.start.x;
    const dy = e.clientY - g.start.y;
    if (Math.hypot(dx, dy) > TAP_PX) g.moved = true;
    if (g.startView.scale > 1) setView(clamp({ ...g.startView, x: g.startView.x + dx, y: g.startView.y + dy }));
    else setView({ scale: 1, x: dx * 0.6, y: 0 }); // the photo follows the finger a little while swiping
  };

  const onPointerUp = (e: ReactPointerEvent) => {
    const g = gesture.current;
    pointers.current.delete(e.pointerId);
    if (!g) return;
    if (pointers.current.size > 0) {
      // One finger lifted from a pinch: carry on panning from here with the other.
      const [rest] = [...pointers.current.values()];
      gesture.current = { start: rest, startView: viewRef.current, moved: true };
      return;
    }
    gesture.current = null;
    const dx = e.clientX - g.start.x;
    const dy = e.clientY - g.start.y;
    if (!g.moved && e.type === "pointerup") {
      if (viewRef.current.scale > 1) reset();
      else zoomAt(e.clientX, e.clientY, CLICK_SCALE, ORIGIN);
      return;
    }
    if (g.startView.scale === 1 && !g.pinch) {
      setView(ORIGIN);
      if (Math.abs(dx) > SWIPE_PX && Math.abs(dx) > Math.abs(dy) * 1.5) onSwipe?.(dx < 0 ? 1 : -1);
    }
  };

  const style = {
    transform: `translate3d(${view.x}px, ${view.y}px, 0) scale(${view.scale})`,
    transition: gesture.current ? "none" : "transform 160ms ease-out",
  };
  return { ref, view, style, reset, zoomBy, handlers: { onPointerDown, onPointerMove, onPointerUp, onPointerCancel: onPointerUp } };
}
