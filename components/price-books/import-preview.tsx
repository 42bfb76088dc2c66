"use client";

import type { ImportAction, ImportPlan } from "@/lib/price-books/import-plan";
import { describeDiff, itemDetails, itemLabel } from "@/lib/price-books/describe";
import { KIND_LABELS } from "@/lib/price-books/kinds";

// Each action has its own mark and word, so colour never carries the meaning alone.
const ACTION_LOOK: Record<ImportAction | "delete", { mark: string; word: string; className: string }> = {
  create: { mark: "+", word: "Add", className: "border-spruce-600 bg-spruce-50 text-spruce-800" },
  update: { mark: "✎", word: "Change", className: "border-brass-400 bg-brass-300/40 text-brass-700" },
  unchanged: { mark: "=", word: "Same", className: "border-maple-300 bg-maple-100 text-graphite-700" },
  delete: { mark: "−", word: "Remove", className: "border-graphite-400 bg-white text-graphite-700" },
  error: { mark: "⚠", word: "Error", className: "border-alarm-600 bg-alarm-50 text-alarm-700" },
};

export function ActionBadge({ action }: { action: ImportAction | "delete" }) {
  const l = ACTION_LOOK[action];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-medium ${l.className}`}>
      <span aria-hidden>{l.mark}</span>
      {l.word}
    </span>
  );
}

const columnName = (c: string) => (c === "_row" ? "row" : c);

/** What an import would do, line by line; errors first, since they block the whole file. */
export function ImportPreview({ plan, showUnchanged }: { plan: ImportPlan; showUnchanged: boolean }) {
  const rows = [...plan.rows.filter((r) => r.action === "error"), ...plan.rows.filter((r) => r.action !== "error" && (showUnchanged || r.action !== "unchanged"))];
  const c = plan.counts;
  return (
    <div className="space-y-3">
      <p className="text-sm text-graphite-900" role="status">
        <span className="num font-semibold">{c.create}</span> to add, <span className="num font-semibold">{c.update}</span> to change,{" "}
        <span className="num font-semibold">{c.delete}</span> to remove, <span className="num">{c.unchanged}</span> unchanged
        {c.error > 0 && (
          <>
            , <span className="num font-semibold text-alarm-700">{c.error}</span> <span className="font-semibold text-alarm-700">with errors</span>
          </>
        )}
        .
      </p>
      {plan.fileErrors.length > 0 && (
        <ul className="space-y-1 rounded-md border border-alarm-600 bg-alarm-50 px-3 py-2 text-sm text-alarm-700" role="alert">
          {plan.fileErrors.map((e) => (
            <li key={`${e.line}-${e.message}`}>
              ⚠ Line <span className="num">{e.line}</span>: {e.message}
            </li>
          ))}
        </ul>
      )}
      {plan.fileNotes.length > 0 && (
        <ul className="space-y-1 rounded-md border border-brass-400 bg-maple-50 px-3 py-2 text-sm text-graphite-900" aria-label="How the file was read">
          {plan.fileNotes.map((n) => (
            <li key={`${n.line}-${n.message}`}>
              <span aria-hidden>ℹ </span>Line <span className="num">{n.line}</span>: {n.message}
            </li>
          ))}
        </ul>
      )}
      {(rows.length > 0 || plan.deletions.length > 0) && (
        <div className="overflow-x-auto rounded-lg border border-maple-200 bg-white">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">What the import would do, by line of the file</caption>
            <thead className="bg-maple-100 text-left text-graphite-700">
              <tr>
                <th scope="col" className="px-2 py-1.5 text-right font-semibold">Line</th>
                <th scope="col" className="px-2 py-1.5 font-semibold">Action</th>
                <th scope="col" className="px-2 py-1.5 font-semibold">Item</th>
                <th scope="col" className="px-2 py-1.5 font-semibold">What changes, or what is wrong</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.line} className="border-b border-maple-100 align-top last:border-0">
                  <td className="num px-2 py-1.5">{r.line}</td>
                  <td className="px-2 py-1.5">
                    <ActionBadge action={r.action} />
                  </td>
                  <td className="px-2 py-1.5">{r.item ? itemLabel(r.item) : `${r.name || "(no name)"}${r.kind ? ` · ${r.kind}` : ""}`}</td>
                  <td className="px-2 py-1.5">
                    {r.action === "error" ? (
                      <ul className="text-alarm-700">
                        {Object.entries(r.errors).map(([col, m]) => (
                          <li key={col}>
                            ⚠ <span className="font-semibold">{columnName(col)}</span>: {m}
                          </li>
                        ))}
                      </ul>
                    ) : r.action === "update" ? (
                      <ul>
                        {describeDiff(r.diff).map((line) => (
                          <li key={line}>{line}</li>
                        ))}
                      </ul>
                    ) : r.action === "create" ? (
                      <span className="text-graphite-900">New item: {r.item ? itemDetails(r.item) : ""}</span>
                    ) : (
                      <span className="text-graphite-600">No change</span>
                    )}
                    {r.notes.length > 0 && (
                      <ul className="mt-1 text-xs text-brass-700">
                        {r.notes.map((n) => (
                          <li key={n}>ℹ {n}</li>
                        ))}
                      </ul>
                    )}
                  </td>
                </tr>
              ))}
              {plan.deletions.map((d) => (
                <tr key={d.id} className="border-b border-maple-100 align-top last:border-0">
                  <td className="num px-2 py-1.5 text-graphite-600">—</td>
                  <td className="px-2 py-1.5">
                    <ActionBadge action="delete" />
                  </td>
                  <td className="px-2 py-1.5">{itemLabel(d)}</td>
                  <td className="px-2 py-1.5 text-graphite-700">Not in the file: removed because the whole list is replaced ({KIND_LABELS[d.kind]})</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
