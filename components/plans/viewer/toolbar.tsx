"use client";

import type { ButtonHTMLAttributes, ReactNode } from "react";
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
}

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
    <div role="toolbar" aria-label="Sheet tools" className="flex flex-wrap items-center gap-1.5 border-b border-maple-200 bg-maple-100 px-2 py-1.5">
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
      {!p.calibrated && <span className="text-xs font-medium text-brass-700">⚠ No scale yet: measuring is off</span>}
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
      <Btn onClick={() => p.fit("width")}>
        Fit width <Kbd>0</Kbd>
      </Btn>
      <Btn onClick={() => p.fit("page")}>Whole page</Btn>
      <Btn onClick={() => p.fit("actual")} title="Real paper size (Shift+0)">
        100%
      </Btn>
      {p.canWrite && (
        <>
          <span className="mx-1 h-6 w-px bg-maple-300" aria-hidden />
          <Btn onClick={p.undo} disabled={!p.canUndo} aria-label="Undo (Ctrl+Z)" title="Undo (Ctrl+Z)">
            ↶ Undo
          </Btn>
          <Btn onClick={p.redo} disabled={!p.canRedo} aria-label="Redo (Ctrl+Shift+Z)" title="Redo (Ctrl+Shift+Z)">
            ↷ Redo
          </Btn>
        </>
      )}
      <span className="ml-auto" />
      <Btn onClick={p.toggleFullWindow} active={p.fullWindow}>
        {p.fullWindow ? "Leave full window" : "Full window"} <Kbd>F</Kbd>
      </Btn>
      <Btn onClick={p.showHelp} aria-label="Keyboard shortcuts">
        Keys <Kbd>?</Kbd>
      </Btn>
    </div>
  );
}
