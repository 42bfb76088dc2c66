import type { ReactNode } from "react";

const SORT_MARK = { asc: "▲", desc: "▼" } as const;
const SORT_WORD = { asc: "ascending", desc: "descending" } as const;

/** A column header of our editable tables: sorts on click, says its order to screen readers, can stay pinned left. */
export function SortableTh({
  sorted,
  end,
  sticky,
  pinEnd = false,
  onToggle,
  children,
}: {
  sorted: false | "asc" | "desc";
  end: boolean;
  sticky: boolean;
  /** Pinned to the right edge: the row's buttons, so a wide table never scrolls them out of reach. */
  pinEnd?: boolean;
  /** Absent for columns that do not sort. */
  onToggle?: (event: unknown) => void;
  children: ReactNode;
}) {
  return (
    <th
      scope="col"
      aria-sort={sorted ? SORT_WORD[sorted] : undefined}
      className={`whitespace-nowrap border-b border-maple-200 px-1.5 py-2 font-semibold ${end ? "text-right" : "text-left"} ${sticky ? "sticky left-0 z-10 bg-maple-100" : ""} ${pinEnd ? "sticky right-0 z-10 bg-maple-100" : ""}`}
    >
      {onToggle ? (
        <button type="button" onClick={onToggle} className="inline-flex items-center gap-1 hover:text-graphite-900">
          {children}
          <span aria-hidden className={`text-[0.65rem] ${sorted ? "text-brass-700" : "text-graphite-400"}`}>
            {sorted ? SORT_MARK[sorted] : "↕"}
          </span>
        </button>
      ) : (
        children
      )}
    </th>
  );
}
