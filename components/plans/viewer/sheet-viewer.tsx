"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { PDFPageProxy } from "pdfjs-dist";
import type { SheetView } from "@/lib/plans/api-types";
import { pageSizeAt1, viewportFor } from "@/lib/plans/viewer/coordinates";
import { baseRenderScale, detailRegion } from "@/lib/plans/viewer/render-plan";
import { zoomPercent } from "@/lib/plans/viewer/view-transform";
import { CalibrationPanel } from "./calibration-panel";
import { CountsPanel } from "./counts-panel";
import { MeasureReadout } from "./measure-readout";
import { NoticeBar, type Notice } from "./notice-bar";
import { OverlayLayer } from "./overlay-layer";
import { SheetPager } from "./sheet-pager";
import { ShortcutsHelp } from "./shortcuts-help";
import { TagLayer } from "./tag-layer";
import { TagPanel } from "./tag-panel";
import { Toolbar } from "./toolbar";
import { toolHint } from "./tools";
import { useDevicePixelRatio } from "./use-device-pixel-ratio";
import { usePointerGestures } from "./use-pointer-gestures";
import { useSheetData, useSheetMutation, type SheetPatch, type SheetScope } from "./use-sheet-data";
import { useTagMutations } from "./use-tag-mutations";
import { useUndoableTagEdits } from "./use-undo";
import { useViewTransform } from "./use-view-transform";
import { useViewerShortcuts } from "./use-viewer-shortcuts";
import { useViewerTools } from "./use-viewer-tools";
import { ViewerSurface } from "./viewer-surface";

export function SheetViewer({ scope, initialSheet, canWrite, plansHref }: { scope: SheetScope; initialSheet: SheetView; canWrite: boolean; plansHref: string }) {
  const data = useSheetData(scope, initialSheet);
  const sheet = data.sheet;
  const [notice, setNotice] = useState<Notice | null>(null);
  const notify = useCallback((tone: Notice["tone"], text: string) => setNotice({ tone, text, at: Date.now() }), []);
  const saveSheet = useSheetMutation(scope, notify);
  const save = useCallback((patch: SheetPatch) => saveSheet.mutateAsync(patch).then(() => true, () => false), [saveSheet]);
  // The undo history is made after the mutations it drives, so a tag deleted elsewhere reaches it via a ref.
  const forget = useRef<(tagId: string) => void>(() => undefined);
  const onGone = useCallback((tagId: string) => forget.current(tagId), []);
  const mutations = useTagMutations(scope, notify, onGone);
  const edits = useUndoableTagEdits(mutations, notify);
  useEffect(() => void (forget.current = edits.forget), [edits.forget]);
  const ipu = sheet.inchesPerUnit;
  const tools = useViewerTools({ canWrite, inchesPerUnit: ipu, types: data.openingTypes, edits, notify });

  const [page, setPage] = useState<PDFPageProxy | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  const [fullWindow, setFullWindow] = useState(false);
  const [helpOpen, setHelpOpen] = useState(false);
  // The side panel folds away to give the drawing the whole width (a tablet has little to spare).
  const [panelOpen, setPanelOpen] = useState(true);
  const dpr = useDevicePixelRatio();
  const rotation = sheet.rotation;

  // Until pdf.js has the page, its size from the sheet row lets the first render start at the right zoom.
  const pageSize = useMemo(() => {
    if (page) return pageSizeAt1(page, rotation);
    const [w, h] = rotation % 180 === 0 ? [sheet.width, sheet.height] : [sheet.height, sheet.width];
    return { width: w * sheet.userUnit, height: h * sheet.userUnit };
  }, [page, rotation, sheet.width, sheet.height, sheet.userUnit]);

  const { boxRef, box, view, settled, setView, zoomBy, fit } = useViewTransform(pageSize);
  const vp = useMemo(() => (page && view ? viewportFor(page, view, rotation) : null), [page, view, rotation]);
  const baseScale = settled ? baseRenderScale(pageSize, settled.zoom, dpr) : null;
  const detail = useMemo(() => (settled && box && baseScale ? detailRegion(settled, pageSize, box, baseScale) : null), [settled, box, baseScale, pageSize]);

  const selected = data.tags.find((t) => t.id === tools.selectedId) ?? null;
  const deleteSelected = useCallback(() => {
    if (!tools.selectedId) return;
    void edits.remove(tools.selectedId);
    tools.setSelectedId(null);
  }, [tools, edits]);

  const keys = useViewerShortcuts({
    canWrite,
    setTool: tools.setTool,
    zoomBy,
    fit,
    panBy: (dx, dy) => setView((v) => ({ ...v, x: v.x + dx, y: v.y + dy })),
    cancel: tools.cancel,
    deleteSelected,
    undo: edits.undo,
    redo: edits.redo,
    pickType: tools.pickType,
    toggleFullWindow: () => setFullWindow((f) => !f),
    showHelp: () => setHelpOpen(true),
  });

  const gestures = usePointerGestures({
    vp,
    view,
    page: pageSize,
    box,
    setView,
    panOnly: keys.spaceHeld,
    onClick: tools.onClick,
    onHover: tools.setHover,
    tagPoint: (id) => data.tags.find((t) => t.id === id) ?? null,
    onTagGrab: tools.setSelectedId,
    onTagDrag: (id, at) => tools.setDragging({ id, at }),
    onTagDrop: tools.dropTag,
  });

  useEffect(() => {
    if (!fullWindow) return;
    const prev = document.body.style.overflow;
    document.body.style.overflow = "hidden";
    return () => void (document.body.style.overflow = prev);
  }, [fullWindow]);

  const first = tools.picks[0];
  const liveMeasure = tools.tool === "measure" && first && tools.hover ? { a: first, b: keys.shift ? { ...tools.hover, ...axis(first, tools.hover) } : tools.hover } : null;
  const interactiveTags = canWrite && (tools.tool === "move" || tools.tool === "tag");
  const activeType = data.openingTypes.find((t) => t.id === tools.activeTypeId);

  return (
    // Wider than the page column (estimators need the room), as tall as the window allows; or the whole window.
    <div
      className={
        fullWindow
          ? "fixed inset-0 z-50 flex flex-col bg-maple-50"
          : "relative left-1/2 flex h-[calc(100dvh-14.5rem)] min-h-[30rem] w-[calc(100vw-2rem)] max-w-[1800px] -translate-x-1/2 flex-col overflow-hidden rounded-lg border border-maple-200 bg-white"
      }
    >
      <header className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-maple-200 px-3 py-1.5">
        <h1 className="text-base font-bold">{sheet.label}</h1>
        <p className="min-w-0 truncate text-xs text-graphite-600">
          {sheet.planSetName} · page {sheet.pageNumber}
          {!canWrite && " · read-only: your role can view and measure"}
        </p>
        <div className="ml-auto">
          <SheetPager
            plansHref={plansHref}
            sheetHref={(id) => plansHref.replace(/\/plans$/, `/sheets/${id}`)}
            previous={data.around.previous}
            next={data.around.next}
            position={data.around.position}
            of={data.around.of}
          />
        </div>
      </header>
      <Toolbar
        tool={tools.tool}
        setTool={tools.setTool}
        canWrite={canWrite}
        calibrated={ipu !== null}
        zoomPercent={view ? zoomPercent(view.zoom) : null}
        zoomBy={zoomBy}
        fit={fit}
        undo={edits.undo}
        redo={edits.redo}
        canUndo={edits.canUndo}
        canRedo={edits.canRedo}
        fullWindow={fullWindow}
        toggleFullWindow={() => setFullWindow((f) => !f)}
        showHelp={() => setHelpOpen(true)}
        panelOpen={panelOpen}
        togglePanel={() => setPanelOpen((o) => !o)}
      />
      <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
        <div className="relative flex min-h-0 flex-1 flex-col">
          <ViewerSurface
            boxRef={boxRef}
            file={{ orgSlug: scope.orgSlug, projectId: scope.projectId, planSetId: sheet.planSetId }}
            pageNumber={sheet.pageNumber}
            rotation={rotation}
            view={view}
            pageSize={pageSize}
            baseScale={baseScale}
            detail={detail}
            dpr={dpr}
            page={page}
            onPage={setPage}
            onError={(e) => setLoadError(e.message)}
            loadError={loadError}
            tool={tools.tool}
            gestures={gestures}
          >
            {vp && (
              <>
                <TagLayer vp={vp} zoom={view?.zoom ?? 1} tags={data.tags} types={data.openingTypes} selectedId={tools.selectedId} dragging={tools.dragging} interactive={interactiveTags} onSelect={tools.setSelectedId} />
                <OverlayLayer vp={vp} tool={tools.tool} picks={tools.picks} hover={tools.hover} shift={keys.shift} inchesPerUnit={ipu} saved={sheet.calibrationPoints} measurement={tools.measurement} />
              </>
            )}
          </ViewerSurface>
          <NoticeBar notice={notice} onDismiss={() => setNotice(null)} />
          <p className="border-t border-maple-200 bg-maple-100 px-3 py-1 text-xs text-graphite-700" aria-live="polite">
            {toolHint(tools.tool, tools.picks.length, ipu !== null)}
            {tools.tool === "tag" && activeType && <strong> Placing {activeType.mark}.</strong>}
          </p>
        </div>
        <aside id="sheet-side-panel" hidden={!panelOpen} aria-label="Sheet details" className="max-h-[40%] w-full space-y-4 overflow-y-auto border-t border-maple-200 bg-maple-50 p-3 lg:max-h-none lg:w-76 lg:border-t-0 lg:border-l">
          <MeasureReadout measurement={tools.tool === "measure" ? tools.measurement : null} live={liveMeasure} inchesPerUnit={ipu} />
          <CalibrationPanel sheet={sheet} canWrite={canWrite} tool={tools.tool} picks={tools.picks} setTool={tools.setTool} save={save} saving={saveSheet.isPending} />
          <TagPanel
            types={data.openingTypes}
            activeTypeId={tools.activeTypeId}
            pickType={(id) => tools.pickType(data.openingTypes.findIndex((t) => t.id === id))}
            selected={selected}
            canWrite={canWrite}
            calibrated={ipu !== null}
            tool={tools.tool}
            retype={(tag, typeId) => void edits.change(tag.id, { openingTypeId: typeId })}
            remove={(tag) => {
              void edits.remove(tag.id);
              tools.setSelectedId(null);
            }}
            measureWidth={tools.measureWidth}
            clearWidth={(tag) => void edits.change(tag.id, { measuredWidth: null })}
            openingsHref={plansHref.replace(/\/plans$/, "/openings")}
          />
          <CountsPanel counts={data.counts} types={data.openingTypes} sheetId={sheet.id} unitTypeId={sheet.unitTypeId} />
        </aside>
      </div>
      <ShortcutsHelp open={helpOpen} onClose={() => setHelpOpen(false)} canWrite={canWrite} />
    </div>
  );
}

function axis(from: { x: number; y: number }, to: { x: number; y: number }) {
  return Math.abs(to.x - from.x) >= Math.abs(to.y - from.y) ? { y: from.y } : { x: from.x };
}
