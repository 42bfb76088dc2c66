"use client";

import { Card, Notice } from "@/components/ui/card";
import { FIELD_LABELS, formatValue } from "@/lib/price-books/describe";
import type { PriceBookChangeView } from "@/lib/price-books/types";

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });

/** Who changed what and when, newest first; the before/after of each field sits behind the summary. */
export function ChangeLog({ changes, error }: { changes: PriceBookChangeView[] | undefined; error: Error | null }) {
  return (
    <Card title="Change log">
      {error && <Notice tone="error">{error.message}</Notice>}
      {!changes && !error && <p className="text-sm text-graphite-600">Loading the log…</p>}
      {changes && changes.length === 0 && <p className="text-sm text-graphite-600">No changes yet.</p>}
      {changes && changes.length > 0 && (
        <ol className="divide-y divide-maple-100 text-sm">
          {changes.map((c) => (
            <li key={c.id} className="py-2">
              <div className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5">
                <time dateTime={new Date(c.at).toISOString()} className="num whitespace-nowrap text-graphite-600">
                  {when.format(new Date(c.at))}
                </time>
                <span className="font-semibold">{c.userName ?? "A former member"}</span>
              </div>
              {c.diff && (c.action === "book.update" || c.action === "item.update") ? (
                <details>
                  <summary className="cursor-pointer">{c.summary}</summary>
                  <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 pl-4 text-xs text-graphite-700">
                    {Object.entries(c.diff).map(([field, { before, after }]) => (
                      <div key={field} className="contents">
                        <dt className="font-medium">{FIELD_LABELS[field] ?? field}</dt>
                        <dd>
                          {formatValue(field, before)} → {formatValue(field, after)}
                        </dd>
                      </div>
                    ))}
                  </dl>
                </details>
              ) : (
                <p>{c.summary}</p>
              )}
            </li>
          ))}
        </ol>
      )}
    </Card>
  );
}
