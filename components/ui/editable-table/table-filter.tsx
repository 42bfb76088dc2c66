"use client";

/** A choice that keeps only the rows whose `column` equals it; "" (`all`) keeps every row. */
export type SelectFilter = { column: string; label: string; all: string; options: readonly (readonly [string, string])[] };

const FIELD = "rounded-md border border-graphite-400 bg-white px-2.5 py-1.5 text-sm text-graphite-900 placeholder:text-graphite-500";

/** Above the table: a text filter over the searchable columns, any select filters, and how many rows show. */
export function TableFilter({
  placeholder,
  text,
  onText,
  selects,
  shown,
  total,
}: {
  placeholder: string;
  text: string;
  onText: (text: string) => void;
  selects: { filter: SelectFilter; value: string; onChange: (value: string) => void }[];
  shown: number;
  total: number;
}) {
  return (
    <div className="flex flex-wrap items-end gap-3">
      <label className="space-y-1 text-sm">
        <span className="block font-medium text-graphite-700">Filter</span>
        <input type="search" className={FIELD} placeholder={placeholder} value={text} onChange={(e) => onText(e.target.value)} />
      </label>
      {selects.map(({ filter, value, onChange }) => (
        <label key={filter.column} className="space-y-1 text-sm">
          <span className="block font-medium text-graphite-700">{filter.label}</span>
          <select className={FIELD} value={value} onChange={(e) => onChange(e.target.value)}>
            <option value="">{filter.all}</option>
            {filter.options.map(([v, name]) => (
              <option key={v} value={v}>
                {name}
              </option>
            ))}
          </select>
        </label>
      ))}
      <p className="pb-1.5 text-sm text-graphite-700" role="status">
        Showing <span className="num font-semibold">{shown}</span> of <span className="num">{total}</span>
      </p>
    </div>
  );
}
