"use client";

import { useEffect, useState } from "react";

/**
 * window.devicePixelRatio, kept current: it changes when the window moves to another screen or the browser
 * zoom changes, and the bitmap must follow or the drawing goes soft.
 */
export function useDevicePixelRatio(): number {
  const [dpr, setDpr] = useState(() => (typeof window === "undefined" ? 1 : window.devicePixelRatio || 1));
  useEffect(() => {
    const mq = window.matchMedia(`(resolution: ${dpr}dppx)`);
    const onChange = () => setDpr(window.devicePixelRatio || 1);
    mq.addEventListener("change", onChange);
    return () => mq.removeEventListener("change", onChange);
  }, [dpr]);
  return dpr;
}
