"use client";

import { useEffect, useRef, useState } from "react";
import type { Tool } from "./tools";

export interface ShortcutActions {
  canWrite: boolean;
  setTool: (t: Tool) => void;
  zoomBy: (factor: number) => void;
  fit: (how: "width" | "page" | "actual") => void;
  panBy: (dx: number, dy: number) => void;
  cancel: () => void;
  deleteSelected: () => void;
  undo: () => void;
  redo: () => void;
  pickType: (index: number) => void;
  toggleFullWindow: () => void;
  showHelp: () => void;
}

const typing = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(t.tagName) || !!t.closest("dialog"));

/** The keys listed in tools.ts SHORTCUTS. Space and Shift are held, not pressed, so they are tracked. */
export function useViewerShortcuts(actions: ShortcutActions) {
  const a = useRef(actions);
  a.current = actions;
  const space = useRef(false);
  const [shift, setShift] = useState(false);

  useEffect(() => {
    function down(e: KeyboardEvent) {
      if (e.key === "Shift") setShift(true);
      if (typing(e.target)) return;
      const x = a.current;
      const mod = e.ctrlKey || e.metaKey;
      const k = e.key.toLowerCase();
      let done = true;
      if (mod && k === "z") (e.shiftKey ? x.redo : x.undo)();
      else if (mod && k === "y") x.redo();
      else if (mod || e.altKey) done = false;
      else if (e.code === "Space" && !(e.target instanceof HTMLButtonElement)) space.current = true;
      else if (e.code === "Digit0" && e.shiftKey) x.fit("actual");
      else if (k === "0") x.fit("width");
      else if (/^[1-9]$/.test(e.key) && x.canWrite) x.pickType(Number(e.key) - 1);
      else if (k === "+" || k === "=") x.zoomBy(1.25);
      else if (k === "-" || k === "_") x.zoomBy(1 / 1.25);
      else if (k === "p") x.fit("page");
      else if (k === "v") x.setTool("move");
      else if (k === "m") x.setTool("measure");
      else if (k === "c" && x.canWrite) x.setTool("calibrate");
      else if (k === "t" && x.canWrite) x.setTool("tag");
      else if (k === "f") x.toggleFullWindow();
      else if (k === "?") x.showHelp();
      else if (k === "escape") x.cancel();
      else if ((k === "delete" || k === "backspace") && x.canWrite) x.deleteSelected();
      else if (k === "arrowleft") x.panBy(80, 0);
      else if (k === "arrowright") x.panBy(-80, 0);
      else if (k === "arrowup") x.panBy(0, 80);
      else if (k === "arrowdown") x.panBy(0, -80);
      else done = false;
      if (done) e.preventDefault();
    }
    function up(e: KeyboardEvent) {
      if (e.key === "Shift") setShift(false);
      if (e.code === "Space") space.current = false;
    }
    const reset = () => {
      space.current = false;
      setShift(false);
    };
    window.addEventListener("keydown", down);
    window.addEventListener("keyup", up);
    window.addEventListener("blur", reset);
    return () => {
      window.removeEventListener("keydown", down);
      window.removeEventListener("keyup", up);
      window.removeEventListener("blur", reset);
    };
  }, []);

  return { spaceHeld: () => space.current, shift };
}
