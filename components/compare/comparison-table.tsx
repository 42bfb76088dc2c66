import { MATERIALS } from "@/takeoff";
import type { ComparisonColumn } from "@/lib/takeoffs/compare";
import { usd } from "@/lib/takeoffs/format";
import { Card } from "@/components/ui/card";
import { LockMark } from "@/components/ui/lock-mark";

const money = (x: number | null) => (x === null ? "—" : usd(x));
const num = (x: number, digits = 0) => x.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: digits });

type Row = { label: string; value: (c: ComparisonColumn) => number | null; show: (x: number | null) => string };

const rows: Row[] = [
  { label: "Openings", value: (c) => c.openings, show: (x) => num(x ?? 0) },
  ...MATERIALS.flatMap((m): Row[] => [
    { label: `${m[0]!.toUpperCase()}${m.slice(1)} — linear ft`, value: (c) => c.materials[m]?.linearFeet ?? 0, show: (x) => num(x ?? 0, 1) },
    { label: `${m[0]!.toUpperCase()}${m.slice(1)} — boards to buy`, value: (c) => c.materials[m]?.boards ?? 0, show: (x) => num(x ?? 0) },
    { label: `${m[0]!.toUpperCase()}${m.slice(1)} — cost`, value: (c) => c.materials[m]?.cost ?? 0, show: money },
  ]),
  { label: "Material", value: (c) => c.material, show: money },
  { label: "Labour hours", value: (c) => c.labourHours, show: (x) => num(x ?? 0, 1) },
  { label: "Labour", value: (c) => c.labour, show: money },
  { label: "Bid total", value: (c) => c.bidTotal, show: money },
  { label: "Per opening", value: (c) => c.perOpening, show: money },
  { label: "Per unit", value: (c) => c.perUnit, show: money },
];

/** Side by side against the first takeoff; a changed figure shows its arrow and difference in words, not by colour alone. */
export function ComparisonTable({ columns, reasons }: { columns: ComparisonColumn[]; reasons: string[][] }) {
  const base = columns[0]!;
  return (
    <Card title="Side by side">
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="border-b border-maple-200 text-left">
            <tr>
              <th className="py-2 pr-3 font-medium text-graphite-600">Compared with the first</th>
              {columns.map((c) => (
                <th key={c.id} className="py-2 pr-3 text-right font-semibold">
                  {c.name}
                  <span className="block text-xs font-normal text-graphite-600">
                    {c.projectName}
                    {c.status === "submitted" && (
                      <>
                        {" · "}
                        <LockMark /> submitted
                      </>
                    )}
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.label} className={`border-b border-maple-100 ${r.label === "Bid total" ? "font-semibold" : ""}`}>
                <th scope="row" className="py-1.5 pr-3 text-left font-normal text-graphite-700">
                  {r.label}
                </th>
                {columns.map((c, i) => {
                  const v = r.value(c);
                  const b = r.value(base);
                  const delta = i > 0 && v !== null && b !== null ? v - b : 0;
                  const changed = Math.abs(delta) > 1e-6;
                  return (
                    <td key={c.id} className={`num py-1.5 pr-3 ${changed ? "bg-brass-300/30" : ""}`}>
                      {r.show(v)}
                      {changed && (
                        <span className="block text-xs text-brass-700">
                          {delta > 0 ? "▲ +" : "▼ −"}
                          {r.show(Math.abs(delta))}
                        </span>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {columns.slice(1).map((c, i) => (
        <div key={c.id} className="mt-4">
          <h3 className="text-sm font-semibold">
            What changed from {base.name} to {c.name}
          </h3>
          {reasons[i + 1]!.length === 0 ? (
            <p className="text-sm text-graphite-600">Same inputs and prices.</p>
          ) : (
            <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">
              {reasons[i + 1]!.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
          )}
        </div>
      ))}
    </Card>
  );
}
