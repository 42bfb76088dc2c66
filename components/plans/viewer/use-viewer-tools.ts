"use client";

import { useCallback, useState } from "react";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { constrainToAxis, measureInches, type Point } from "@/lib/plans/calibration";
import type { Measurement } from "./overlay-layer";
import { TWO_POINT_TOOLS, type Tool } from "./tools";
import type { TagEdits } from "./use-undo";
import type { Notify } from "./use-tag-mutations";

interface Options {
  canWrite: boolean;
  inchesPerUnit: number | null;
  types: OpeningTypeView[];
  edits: TagEdits;
  notify: Notify;
}

/** Which tool is in hand and what it has picked so far; clicks on the drawing land here, in PDF points. */
export function useViewerTools({ canWrite, inchesPerUnit, types, edits, notify }: Options) {
  const [tool, setToolState] = useState<Tool>("move");
  const [picks, setPicks] = useState<Point[]>([]);
  const [hover, setHover] = useState<Point | null>(null);
  const [measurement, setMeasurement] = useState<Measurement | null>(null);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [activeTypeId, setActiveTypeId] = useState<string | null>(null);
  const [dragging, setDragging] = useState<{ id: string; at: Point } | null>(null);

  const setTool = useCallback(
    (t: Tool) => {
      // Read-only members may look and measure (checking the scale is measuring too), never change anything.
      if (!canWrite && t !== "move" && t !== "measure" && t !== "check") return;
      if ((t === "measure" || t === "check" || t === "width") && !inchesPerUnit) {
        notify("info", "Measuring needs a calibrated sheet: pick two points on a known dimension, or choose the sheet's scale.");
        return;
      }
      if (t === "tag" && types.length === 0) {
        notify("info", "Add opening types to the window list first; then tag them here.");
        return;
      }
      if (t === "tag") setActiveTypeId((cur) => (cur && types.some((x) => x.id === cur) ? cur : (types[0]?.id ?? null)));
      setToolState(t);
      setPicks([]);
    },
    [canWrite, inchesPerUnit, types, notify],
  );

  const pickType = useCallback(
    (index: number) => {
      const type = types[index];
      if (!type) return;
      setActiveTypeId(type.id);
      setToolState("tag");
      setPicks([]);
    },
    [types],
  );

  const onClick = useCallback(
    (raw: Point, shift: boolean) => {
      if (tool === "move") return setSelectedId(null);
      if (tool === "tag") {
        if (activeTypeId) void edits.place({ openingTypeId: activeTypeId, x: raw.x, y: raw.y, measuredWidth: null });
        return;
      }
      if (!TWO_POINT_TOOLS.includes(tool)) return;
      const first = picks.length === 1 ? picks[0] : undefined;
      const at = first && shift ? constrainToAxis(first, raw) : raw;
      if (!first) return setPicks([at]);
      if (tool === "measure") {
        setMeasurement({ a: first, b: at });
        setPicks([]);
      } else if (tool === "width" && selectedId && inchesPerUnit) {
        void edits.change(selectedId, { measuredWidth: measureInches(first, at, inchesPerUnit) });
        setPicks([]);
        setToolState("move");
      } else setPicks([first, at]);
    },
    [tool, activeTypeId, edits, picks, selectedId, inchesPerUnit],
  );

  const cancel = useCallback(() => {
    if (picks.length > 0) return setPicks([]);
    if (tool !== "move") return setToolState("move");
    setMeasurement(null);
    setSelectedId(null);
  }, [picks.length, tool]);

  const measureWidth = useCallback(() => {
    if (!selectedId) return;
    setTool("width");
  }, [selectedId, setTool]);

  const dropTag = useCallback(
    (id: string, at: Point | null) => {
      if (!at || !canWrite) return setDragging(null);
      // Keep drawing it where it was dropped until the server has answered, so it never hops back a frame.
      void edits.change(id, { x: at.x, y: at.y }).finally(() => setDragging((d) => (d?.id === id ? null : d)));
    },
    [canWrite, edits],
  );

  return {
    tool,
    setTool,
    picks,
    hover,
    setHover,
    measurement,
    selectedId,
    setSelectedId,
    activeTypeId,
    pickType,
    onClick,
    cancel,
    measureWidth,
    dragging,
    setDragging,
    dropTag,
  };
}
