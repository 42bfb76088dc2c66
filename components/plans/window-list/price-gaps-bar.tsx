"use client";

import type { usePriceGaps } from "./use-price-gaps";

/** Which price book the window list is checked against, and how many of its lines that book cannot price. */
export function PriceGapsBar({ books, gaps, priceBookId, choose }: ReturnType<typeof usePriceGaps>) {
  const list = books.data ?? [];
  const found = gaps.data?.gaps ?? [];
  const marks = [...new Set(found.map((g) => g.mark))];
  if (books.data && list.length === 0) {
    return <p className="text-sm text-graphite-700">No price book yet: an admin adds one before a takeoff can price this list.</p>;
  }
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm" aria-live="polite">
      <label className="flex items-center gap-2">
        <span className="text-graphite-700">Check prices against</span>
        <select
          className="rounded border border-graphite-400 bg-white px-2 py-1 text-sm"
          value={priceBookId ?? ""}
          onChange={(e) => choose(e.target.value || null)}
          disabled={list.length === 0}
        >
          {list.map((b) => (
            <option key={b.id} value={b.id}>
              {b.name}
            </option>
          ))}
        </select>
      </label>
      {gaps.isError && <span className="text-alarm-700">⚠ {gaps.error.message}</span>}
      {gaps.data &&
        (found.length === 0 ? (
          <span className="text-spruce-800">✓ The price book has every size this list needs.</span>
        ) : (
          <span className="font-medium text-graphite-900" data-gap-summary>
            <span aria-hidden>△ </span>
            {found.length} gap{found.length === 1 ? "" : "s"} in {gaps.data.priceBook?.name} for {marks.join(", ")} (shown under {marks.length === 1 ? "its line" : "each line"}). A takeoff
            can still run with placeholder prices, but cannot be submitted until they are filled.
          </span>
        ))}
    </div>
  );
}
