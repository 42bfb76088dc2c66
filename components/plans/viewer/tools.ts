/** The viewer's tools and the one table of keyboard shortcuts (the handler and the help list both read it). */

export type Tool = "move" | "calibrate" | "check" | "measure" | "tag" | "width";

/** Tools that take two picked points; Shift keeps the second level or plumb with the first. */
export const TWO_POINT_TOOLS: readonly Tool[] = ["calibrate", "check", "measure", "width"];

export const TOOL_LABELS: Record<Tool, string> = {
  move: "Move",
  calibrate: "Calibrate",
  check: "Check scale",
  measure: "Measure",
  tag: "Tag",
  width: "Measure width",
};

/** What the status line says while a tool waits for a click, by number of points picked so far. */
export function toolHint(tool: Tool, picked: number, calibrated: boolean): string {
  const shift = " Hold Shift to keep it level or plumb.";
  switch (tool) {
    case "move":
      return "Drag to pan, wheel to zoom. Click a tag to select it; drag it to move it.";
    case "calibrate":
      return picked === 0
        ? "Calibrate: click one end of a dimension whose length you know." + shift
        : picked === 1
          ? "Calibrate: click the other end." + shift
          : "Calibrate: type the known length in the panel, then save.";
    case "check":
      return picked < 2 ? `Check: click ${picked === 0 ? "one end" : "the other end"} of a second known dimension.` + shift : "Check: type its true length in the panel.";
    case "measure":
      if (!calibrated) return "Measure needs a calibrated sheet: calibrate it or pick its scale first.";
      return picked === 1 ? "Measure: click the other end." + shift : "Measure: click the first end." + shift;
    case "tag":
      return "Tag: each click places a tag of the chosen opening type. Keys 1–9 pick the type.";
    case "width":
      return picked === 0 ? "Width: click the first jamb line." + shift : "Width: click the other jamb line." + shift;
  }
}

export interface Shortcut {
  keys: string[];
  what: string;
  /** Only for those who may edit. */
  write?: boolean;
}

export const SHORTCUTS: readonly Shortcut[] = [
  { keys: ["V"], what: "Move: select, drag tags, pan" },
  { keys: ["C"], what: "Calibrate", write: true },
  { keys: ["M"], what: "Measure" },
  { keys: ["T"], what: "Tag", write: true },
  { keys: ["1", "…", "9"], what: "Pick opening type and tag", write: true },
  { keys: ["+"], what: "Zoom in" },
  { keys: ["−"], what: "Zoom out" },
  { keys: ["0"], what: "Fit width" },
  { keys: ["Shift", "0"], what: "100% (real paper size)" },
  { keys: ["P"], what: "Fit whole page" },
  { keys: ["←", "↑", "→", "↓"], what: "Pan" },
  { keys: ["Space", "drag"], what: "Pan with any tool (or drag with the middle button)" },
  { keys: ["Shift"], what: "Hold while picking: keep level or plumb" },
  { keys: ["Esc"], what: "Cancel picking, clear selection" },
  { keys: ["Delete"], what: "Delete the selected tag", write: true },
  { keys: ["Ctrl/⌘", "Z"], what: "Undo", write: true },
  { keys: ["Ctrl/⌘", "Shift", "Z"], what: "Redo (also Ctrl+Y)", write: true },
  { keys: ["F"], what: "Full window on/off" },
  { keys: ["?"], what: "Show these shortcuts" },
];
