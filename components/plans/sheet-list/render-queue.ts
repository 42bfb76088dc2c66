"use client";

import { useEffect, useState, type RefObject } from "react";

/**
 * Page rendering runs on the main thread; two at a time keeps scrolling smooth on a tablet while the
 * thumbnails that came into view fill in one after another.
 */
const MAX_RENDERING = 2;
let rendering = 0;
const waiting: (() => void)[] = [];

function next() {
  while (rendering < MAX_RENDERING && waiting.length > 0) {
    rendering++;
    waiting.shift()!();
  }
}

/** True while this caller holds a render slot; asking stops (and the slot frees) when `wanted` turns false. */
export function useRenderSlot(wanted: boolean): boolean {
  const [granted, setGranted] = useState(false);
  useEffect(() => {
    if (!wanted) return;
    let held = false;
    const grant = () => {
      held = true;
      setGranted(true);
    };
    waiting.push(grant);
    next();
    return () => {
      if (held) {
        rendering--;
        next();
      } else {
        const i = waiting.indexOf(grant);
        if (i >= 0) waiting.splice(i, 1);
      }
      setGranted(false);
    };
  }, [wanted]);
  return granted && wanted;
}

/** Whether the element is on screen or within `margin` of it. */
export function useInView(ref: RefObject<Element | null>, margin = "200px"): boolean {
  const [inView, setInView] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const observer = new IntersectionObserver((entries) => setInView(entries.some((e) => e.isIntersecting)), { rootMargin: margin });
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, margin]);
  return inView;
}
