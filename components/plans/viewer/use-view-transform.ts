"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import {
  ACTUAL_SIZE_ZOOM,
  clampPan,
  fitPage,
  fitWidth,
  wheelFactor,
  zoomAt,
  zoomCentered,
  type Size,
  type View,
} from "@/lib/plans/viewer/view-transform";

/** How long the view must stay still before the page is re-rendered sharp at the new zoom. */
const SETTLE_MS = 180;

/**
 * The live view (changes every pointer move, drawn by CSS-scaling the last bitmap) and the settled view
 * (what pdf.js renders at). `page` is the rotated page size at zoom 1.
 */
export function useViewTransform(page: Size | null) {
  const boxRef = useRef<HTMLDivElement | null>(null);
  const [box, setBox] = useState<Size | null>(null);
  const [view, setViewState] = useState<View | null>(null);
  const [settled, setSettled] = useState<View | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const live = useRef<{ view: View | null; box: Size | null; page: Size | null }>({ view: null, box: null, page: null });
  live.current = { view, box, page };

  // A stream of changes (drag, wheel, pinch) waits to settle; a single step (a key, a button) renders at once.
  const setView = useCallback((next: View | ((v: View) => View), opts: { settleNow?: boolean } = {}) => {
    const { view: cur, box: b, page: p } = live.current;
    if (!cur || !b || !p) return;
    const v = clampPan(typeof next === "function" ? next(cur) : next, p, b);
    live.current.view = v;
    setViewState(v);
    if (timer.current) clearTimeout(timer.current);
    if (opts.settleNow) setSettled(v);
    else timer.current = setTimeout(() => setSettled(live.current.view), SETTLE_MS);
  }, []);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  useEffect(() => {
    const el = boxRef.current;
    if (!el) return;
    const ro = new ResizeObserver(([entry]) => {
      if (entry) setBox({ width: entry.contentRect.width, height: entry.contentRect.height });
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  // First sight of the sheet: fit its width, and render straight at that zoom (no settle wait).
  useEffect(() => {
    if (box && page && !live.current.view && box.width > 0) {
      const v = fitWidth(page, box);
      live.current.view = v;
      setViewState(v);
      setSettled(v);
    }
  }, [box, page]);

  // A resized viewer (full window, rotated tablet) re-settles so the sharp tile covers the new area.
  useEffect(() => {
    if (box && live.current.view) setView((v) => v);
  }, [box, setView]);

  const zoomBy = useCallback(
    (factor: number, anchor?: { x: number; y: number }) => {
      const { box: b, page: p } = live.current;
      if (!b || !p) return;
      // Wheel zoom passes its pointer as the anchor and comes in streams; buttons and keys are single steps.
      setView((v) => zoomAt(v, factor, anchor ?? { x: b.width / 2, y: b.height / 2 }, p, b), { settleNow: !anchor });
    },
    [setView],
  );

  const fit = useCallback(
    (how: "width" | "page" | "actual") => {
      const { box: b, page: p } = live.current;
      if (!b || !p) return;
      setView((v) => (how === "width" ? fitWidth(p, b) : how === "page" ? fitPage(p, b) : zoomCentered(v, ACTUAL_SIZE_ZOOM, p, b)), { settleNow: true });
    },
    [setView],
  );

  // React's onWheel is passive, so it cannot stop the page from scrolling; a native listener can.
  useEffect(() => {
    const el = boxRef.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      zoomBy(wheelFactor(e.deltaY, e.deltaMode), { x: e.clientX - r.left, y: e.clientY - r.top });
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, [zoomBy]);

  return { boxRef, box, view, settled, setView, zoomBy, fit };
}
