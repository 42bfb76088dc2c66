"use client";

import type { ButtonHTMLAttributes, ReactNode } from "react";
import { Expand, Keyboard, PanelRightClose, PanelRightOpen, Redo2, Shrink, TriangleAlert, Undo2 } from "lucide-react";
import { Kbd } from "./kbd";
import { TOOL_LABELS, type Tool } from "./tools";

interface Props {
  tool: Tool;
  setTool: (t: Tool) => void;
  canWrite: boolean;
  calibrated: boolean;
  zoomPercent: number | null;
  zoomBy: (factor: number) => void;
  fit: (how: "width" | "page" | "actual") => void;
  undo: () => void;
  redo: () => void;
  canUndo: boolean;
  canRedo: boolean;
  fullWindow: boolean;
  toggleFullWindow: () => void;
  showHelp: () => void;
  panelOpen: boolean;
  togglePanel: () => void;
}

/** Words beside an icon that give way to the icon alone below 1280 px (the button keeps its name). */
const Wide = ({ children }: { children: ReactNode }) => <span className="hidden xl:inline">{children}</span>;
const ICON = "size-4 shrink-0";

function Btn({ active, children, ...rest }: { active?: boolean; children: ReactNode } & ButtonHTMLAttributes<HTMLButtonElement>) {
  return (
    <button
      type="button"
      aria-pressed={active}
      className={`inline-flex h-8 items-center gap-1.5 rounded-md border px-2 text-sm font-medium disabled:cursor-not-allowed disabled:opacity-50 ${
        active ? "border-spruce-800 bg-spruce-700 text-maple-50 [&_kbd]:text-graphite-900" : "border-graphite-400 bg-white text-graphite-900 hover:bg-maple-100"
      }`}
      {...rest}
    >
      {children}
    </button>
  );
}

const TOOLS: { tool: Tool; key: string; write: boolean }[] = [
  { tool: "move", key: "V", write: false },
  { tool: "calibrate", key: "C", write: true },
  { tool: "measure", key: "M", write: false },
  { tool: "tag", key: "T", write: true },
];

export function Toolbar(p: Props) {
  const current = p.tool === "check" ? "calibrate" : p.tool === "width" ? "move" : p.tool;
  return (
    // One row at 1024 px and up: key hints and some words drop below 1280 px, the rest scrolls rather than wraps.
    <div role="toolbar" aria-label="Sheet tools" className="flex items-center gap-1.5 overflow-x-auto border-b border-maple-200 bg-maple-100 px-2 py-1.5 whitespace-nowrap">
      {TOOLS.filter((t) => p.canWrite || !t.write).map(({ tool, key }) => (
        <Btn
          key={tool}
          active={current === tool}
          disabled={tool === "measure" && !p.calibrated}
          title={tool === "measure" && !p.calibrated ? "Measuring needs a calibrated sheet" : undefined}
          onClick={() => p.setTool(tool)}
        >
          {TOOL_LABELS[tool]} <Kbd>{key}</Kbd>
        </Btn>
      ))}
      {!p.calibrated && (
        <span className="inline-flex items-center gap-1 text-xs font-medium text-brass-700" title="No scale yet: measuring is off until the sheet is calibrated">
          <TriangleAlert aria-hidden className="size-3.5" /> No scale<Wide> yet: measuring is off</Wide>
        </span>
      )}
      <span className="mx-1 h-6 w-px bg-maple-300" aria-hidden />
      <Btn onClick={() => p.zoomBy(1 / 1.25)} aria-label="Zoom out">
        −
      </Btn>
      <span className="num w-12 text-sm tabular-nums text-graphite-700" aria-live="polite" aria-label="Zoom">
        {p.zoomPercent === null ? "—" : `${p.zoomPercent}%`}
      </span>
      <Btn onClick={() => p.zoomBy(1.25)} aria-label="Zoom in">
        +
      </Btn>
      <Btn onClick={() => p.fit("width")} aria-label="Fit width">
        <Wide>Fit width</Wide>
        <span className="xl:hidden">Width</span> <Kbd>0</Kbd>
      </Btn>
      <Btn onClick={() => p.fit("page")} aria-label="Whole page">
        <Wide>Whole page</Wide>
        <span className="xl:hidden">Page</span>
      </Btn>
      <Btn onClick={() => p.fit("actual")} title="Real paper size (Shift+0)">
        100%
      </Btn>
      {p.canWrite && (
        <>
          <span className="mx-1 h-6 w-px bg-maple-300" aria-hidden />
          <Btn onClick={p.undo} disabled={!p.canUndo} aria-label="Undo (Ctrl+Z)" title="Undo (Ctrl+Z)">
            <Undo2 aria-hidden className={ICON} />
            <Wide>Undo</Wide>
          </Btn>
          <Btn onClick={p.redo} disabled={!p.canRedo} aria-label="Redo (Ctrl+Shift+Z)" title="Redo (Ctrl+Shift+Z)">
            <Redo2 aria-hidden className={ICON} />
            <Wide>Redo</Wide>
          </Btn>
        </>
      )}
      <span className="ml-auto" />
      <Btn onClick={p.toggleFullWindow} active={p.fullWindow} aria-label={p.fullWindow ? "Leave full window" : "Full window"} title="Full window (F)">
        {p.fullWindow ? <Shrink aria-hidden className={ICON} /> : <Expand aria-hidden className={ICON} />}
        <Wide>{p.fullWindow ? "Leave full window" : "Full window"}</Wide> <Kbd>F</Kbd>
      </Btn>
      <Btn onClick={p.togglePanel} active={!p.panelOpen} aria-label={p.panelOpen ? "Hide side panel" : "Show side panel"} aria-expanded={p.panelOpen} aria-controls="sheet-side-panel" title={p.panelOpen ? "Hide side panel" : "Show side panel"}>
        {p.panelOpen ? <PanelRightClose aria-hidden className={ICON} /> : <PanelRightOpen aria-hidden className={ICON} />}
        <Wide>Panel</Wide>
      </Btn>
      <Btn onClick={p.showHelp} aria-label="Keyboard shortcuts" title="Keyboard shortcuts (?)">
        <Keyboard aria-hidden className={ICON} />
        <Wide>Keys</Wide> <Kbd>?</Kbd>
      </Btn>
    </div>
  );
}
