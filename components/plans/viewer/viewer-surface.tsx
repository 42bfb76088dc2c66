"use client";

import dynamic from "next/dynamic";
import type { ReactNode, RefObject } from "react";
import type { PdfPageLayerProps } from "./pdf-page-layer";
import type { Tool } from "./tools";
import type { usePointerGestures } from "./use-pointer-gestures";

// react-pdf and pdf.js touch browser APIs at import time: load them on the client only.
const PdfPageLayer = dynamic(() => import("./pdf-page-layer"), { ssr: false });

/** Everything the page layer takes, plus what the surface itself needs. */
interface Props extends PdfPageLayerProps {
  boxRef: RefObject<HTMLDivElement | null>;
  loadError: string | null;
  tool: Tool;
  gestures: ReturnType<typeof usePointerGestures>;
  children: ReactNode;
}

const CURSORS: Record<Tool, string> = {
  move: "cursor-grab active:cursor-grabbing",
  calibrate: "cursor-crosshair",
  check: "cursor-crosshair",
  measure: "cursor-crosshair",
  width: "cursor-crosshair",
  tag: "cursor-copy",
};

/** The working surface: the drawing, then the overlays (children) on top, all fed by pointer gestures. */
export function ViewerSurface(p: Props) {
  return (
    <div
      ref={p.boxRef}
      {...p.gestures}
      onContextMenu={(e) => e.preventDefault()}
      onAuxClick={(e) => e.preventDefault()}
      className={`relative min-h-0 flex-1 touch-none overflow-hidden bg-[#e9e4d8] select-none ${CURSORS[p.tool]}`}
      aria-label="Sheet drawing"
      role="application"
    >
      <PdfPageLayer
        file={p.file}
        pageNumber={p.pageNumber}
        rotation={p.rotation}
        view={p.view}
        pageSize={p.pageSize}
        baseScale={p.baseScale}
        detail={p.detail}
        dpr={p.dpr}
        page={p.page}
        onPage={p.onPage}
        onError={p.onError}
      />
      {!p.page && !p.loadError && (
        <p className="absolute top-4 left-4 rounded-md bg-white/90 px-3 py-2 text-sm text-graphite-700 shadow" role="status">
          Opening the sheet…
        </p>
      )}
      {p.loadError && (
        <p className="absolute top-4 left-4 max-w-md rounded-md border border-alarm-600 bg-alarm-50 px-3 py-2 text-sm text-alarm-700" role="alert">
          ⚠ The plan file could not be opened: {p.loadError}
        </p>
      )}
      {p.page && p.children}
    </div>
  );
}
