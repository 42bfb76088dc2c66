"use client";

import { useRef, type PointerEvent } from "react";
import type { Point } from "@/lib/plans/calibration";
import { toPdf, toScreen, type ViewportLike } from "@/lib/plans/viewer/coordinates";
import { zoomAt, type Size, type View } from "@/lib/plans/viewer/view-transform";

export interface GestureHandlers {
  vp: ViewportLike | null;
  view: View | null;
  page: Size | null;
  box: Size | null;
  setView: (next: View | ((v: View) => View)) => void;
  /** Space is held: every drag pans. */
  panOnly: () => boolean;
  onClick: (at: Point, shift: boolean) => void;
  onHover: (at: Point | null) => void;
  tagPoint: (id: string) => Point | null;
  onTagGrab: (id: string) => void;
  onTagDrag: (id: string, at: Point) => void;
  onTagDrop: (id: string, at: Point | null) => void;
}

type Gesture =
  | { kind: "press"; start: Point; view: View }
  | { kind: "pan"; start: Point; view: View }
  | { kind: "tag"; id: string; start: Point; grab: Point; moved: boolean }
  | { kind: "pinch"; dist: number; mid: Point; view: View };

const local = (e: PointerEvent<HTMLElement>): Point => {
  const r = e.currentTarget.getBoundingClientRect();
  return { x: e.clientX - r.left, y: e.clientY - r.top };
};

/**
 * Pointer events (mouse, pen and touch alike) on the viewer: a press that barely moves is a click on the
 * drawing; one that travels pans; two fingers pinch-zoom; a press on a tag chip drags the tag.
 */
export function usePointerGestures(h: GestureHandlers) {
  const pointers = useRef(new Map<number, Point>());
  const gesture = useRef<Gesture | null>(null);
  const ref = useRef(h);
  ref.current = h;

  const pinchOf = (): { dist: number; mid: Point } | null => {
    const [a, b] = [...pointers.current.values()];
    if (!a || !b) return null;
    return { dist: Math.hypot(b.x - a.x, b.y - a.y) || 1, mid: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } };
  };

  function onPointerDown(e: PointerEvent<HTMLElement>) {
    const { vp, view, panOnly, tagPoint, onTagGrab } = ref.current;
    if (!vp || !view || (e.pointerType === "mouse" && e.button !== 0 && e.button !== 1)) return;
    const p = local(e);
    pointers.current.set(e.pointerId, p);
    e.currentTarget.setPointerCapture(e.pointerId);
    const pinch = pointers.current.size === 2 ? pinchOf() : null;
    if (pinch) {
      if (gesture.current?.kind === "tag") ref.current.onTagDrop(gesture.current.id, null);
      gesture.current = { kind: "pinch", ...pinch, view };
      return;
    }
    if (pointers.current.size > 1) return;
    if (e.button === 1 || panOnly()) {
      e.preventDefault();
      gesture.current = { kind: "pan", start: p, view };
      return;
    }
    const chip = (e.target as Element).closest?.("[data-tag-id]");
    const id = chip?.getAttribute("data-tag-id");
    const at = id ? tagPoint(id) : null;
    if (id && at) {
      const s = toScreen(vp, at);
      gesture.current = { kind: "tag", id, start: p, grab: { x: p.x - s.x, y: p.y - s.y }, moved: false };
      onTagGrab(id);
      return;
    }
    gesture.current = { kind: "press", start: p, view };
  }

  function onPointerMove(e: PointerEvent<HTMLElement>) {
    const { vp, setView, page, box, onHover, onTagDrag } = ref.current;
    if (!vp) return;
    const p = local(e);
    if (pointers.current.has(e.pointerId)) pointers.current.set(e.pointerId, p);
    const g = gesture.current;
    const slop = e.pointerType === "touch" ? 10 : 4;
    if (!g) {
      if (e.pointerType !== "touch") onHover(toPdf(vp, p));
      return;
    }
    if (g.kind === "pinch") {
      const now = pinchOf();
      if (!now || !page || !box) return;
      const z = zoomAt(g.view, now.dist / g.dist, g.mid, page, box);
      setView({ zoom: z.zoom, x: z.x + now.mid.x - g.mid.x, y: z.y + now.mid.y - g.mid.y });
      return;
    }
    if (g.kind === "press" && Math.hypot(p.x - g.start.x, p.y - g.start.y) > slop) gesture.current = { kind: "pan", start: g.start, view: g.view };
    const cur = gesture.current;
    if (cur?.kind === "pan") setView({ zoom: cur.view.zoom, x: cur.view.x + p.x - cur.start.x, y: cur.view.y + p.y - cur.start.y });
    else if (cur?.kind === "tag") {
      if (!cur.moved && Math.hypot(p.x - cur.start.x, p.y - cur.start.y) <= slop) return;
      cur.moved = true;
      onTagDrag(cur.id, toPdf(vp, { x: p.x - cur.grab.x, y: p.y - cur.grab.y }));
    } else if (e.pointerType !== "touch") onHover(toPdf(vp, p));
  }

  function end(e: PointerEvent<HTMLElement>, cancelled: boolean) {
    const { vp, onClick, onTagDrop } = ref.current;
    pointers.current.delete(e.pointerId);
    const g = gesture.current;
    if (!g || !vp) return;
    if (g.kind === "pinch") {
      // One finger still down after a pinch must not turn into a click or a jump.
      if (pointers.current.size === 0) gesture.current = null;
      return;
    }
    gesture.current = null;
    const p = local(e);
    if (g.kind === "tag") onTagDrop(g.id, g.moved && !cancelled ? toPdf(vp, { x: p.x - g.grab.x, y: p.y - g.grab.y }) : null);
    else if (g.kind === "press" && !cancelled) onClick(toPdf(vp, p), e.shiftKey);
  }

  return {
    onPointerDown,
    onPointerMove,
    onPointerUp: (e: PointerEvent<HTMLElement>) => end(e, false),
    onPointerCancel: (e: PointerEvent<HTMLElement>) => end(e, true),
    onPointerLeave: () => {
      if (!gesture.current) ref.current.onHover(null);
    },
  };
}
