"use client";

import type { OpeningTypeView } from "@/lib/plans/api-types";
import { tintAt } from "@/lib/plans/viewer/palette";
import { formatLength } from "@/takeoff";
import { Kbd } from "./kbd";
import type { Tool } from "./tools";
import type { ViewerTag } from "./use-sheet-data";

interface Props {
  types: OpeningTypeView[];
  activeTypeId: string | null;
  pickType: (id: string) => void;
  selected: ViewerTag | null;
  canWrite: boolean;
  calibrated: boolean;
  tool: Tool;
  retype: (tag: ViewerTag, typeId: string) => void;
  remove: (tag: ViewerTag) => void;
  measureWidth: () => void;
  clearWidth: (tag: ViewerTag) => void;
  openingsHref: string;
}

const size = (t: OpeningTypeView) => `${formatLength(t.width)} × ${formatLength(t.height)}`;

export function Swatch({ index, mark }: { index: number; mark: string }) {
  const tint = tintAt(index);
  return (
    <span className="inline-flex h-5 min-w-7 items-center justify-center rounded-[5px] border border-graphite-900/60 px-1.5 text-[11px] font-bold" style={{ backgroundColor: tint.fill, color: tint.text }}>
      {mark}
    </span>
  );
}

export function TagPanel(p: Props) {
  const { types, selected } = p;
  const selIndex = selected ? types.findIndex((t) => t.id === selected.openingTypeId) : -1;
  const selType = types[selIndex];
  return (
    <section aria-labelledby="tags-title" className="space-y-2">
      <h3 id="tags-title" className="text-sm font-semibold">
        Opening types
      </h3>
      {types.length === 0 ? (
        <p className="text-xs text-graphite-700">
          This project has no opening types yet. Add W1, W2 … on the{" "}
          <a href={p.openingsHref} className="text-spruce-700 underline">
            window list
          </a>{" "}
          to tag them here.
        </p>
      ) : (
        <ul className="max-h-56 space-y-0.5 overflow-y-auto" role={p.canWrite ? "listbox" : undefined} aria-label="Opening type to place">
          {types.map((t, i) => {
            const active = p.canWrite && t.id === p.activeTypeId && p.tool === "tag";
            return (
              <li key={t.id} role={p.canWrite ? "option" : undefined} aria-selected={p.canWrite ? active : undefined}>
                <button
                  type="button"
                  disabled={!p.canWrite}
                  onClick={() => p.pickType(t.id)}
                  className={`flex w-full items-center gap-2 rounded-md px-1.5 py-1 text-left text-xs disabled:cursor-default ${active ? "bg-spruce-50 ring-1 ring-spruce-600" : "enabled:hover:bg-maple-100"}`}
                >
                  <Swatch index={i} mark={t.mark} />
                  <span className="flex-1 text-graphite-700">{size(t)}</span>
                  {p.canWrite && i < 9 && <Kbd>{String(i + 1)}</Kbd>}
                  {active && <span className="sr-only">(placing)</span>}
                </button>
              </li>
            );
          })}
        </ul>
      )}

      {selected && (
        <div className="space-y-1.5 rounded-md border border-graphite-400 bg-white p-2 text-xs" aria-live="polite">
          <p className="flex items-center gap-2 font-semibold">
            Selected tag <Swatch index={selIndex} mark={selType?.mark ?? "?"} />
          </p>
          {p.canWrite && (
            <label className="flex items-center gap-2">
              <span className="text-graphite-600">Type</span>
              <select value={selected.openingTypeId} onChange={(e) => p.retype(selected, e.target.value)} className="flex-1 rounded-md border border-graphite-400 bg-white px-1 py-0.5 text-xs">
                {types.map((t) => (
                  <option key={t.id} value={t.id}>
                    {t.mark} — {size(t)}
                  </option>
                ))}
              </select>
            </label>
          )}
          <p>
            <span className="text-graphite-600">Measured width: </span>
            {selected.measuredWidth === null ? "—" : formatLength(selected.measuredWidth)}
            {selType && selected.measuredWidth !== null && <span className="text-graphite-600"> (type: {formatLength(selType.width)})</span>}
          </p>
          {selected.widthMismatch && (
            <p role="status" className="rounded border border-brass-500 bg-maple-100 px-1.5 py-1">
              <strong>≠ Width mismatch:</strong> the drawing measures more than 1&quot; off the type&apos;s width. Check the type or the tag.
            </p>
          )}
          {p.canWrite && (
            <div className="flex flex-wrap gap-1.5 pt-1">
              <button type="button" disabled={!p.calibrated} onClick={p.measureWidth} className="rounded-md border border-graphite-400 px-2 py-0.5 hover:bg-maple-100 disabled:opacity-50" title={p.calibrated ? "Click the two jamb lines" : "Needs a calibrated sheet"}>
                {p.tool === "width" ? "Click the jamb lines…" : "Measure width"}
              </button>
              {selected.measuredWidth !== null && (
                <button type="button" onClick={() => p.clearWidth(selected)} className="rounded-md px-2 py-0.5 text-spruce-700 hover:bg-maple-100">
                  Clear width
                </button>
              )}
              <button type="button" onClick={() => p.remove(selected)} className="ml-auto rounded-md border border-graphite-400 px-2 py-0.5 text-graphite-900 hover:bg-maple-100">
                Delete <Kbd>Del</Kbd>
              </button>
            </div>
          )}
        </div>
      )}
    </section>
  );
}
