import { usd } from "@/lib/takeoffs/format";
import type { TakeoffResult } from "@/takeoff";

/** A takeoff priced partly with placeholders says so at the top, with what is missing and how each was priced. */
export function PlaceholderNotice({ result }: { result: TakeoffResult }) {
  const placeholders = result.placeholders ?? [];
  if (placeholders.length === 0) return null;
  return (
    <section aria-label="Placeholder prices" className="rounded-md border-2 border-alarm-600 bg-alarm-50 px-4 py-3 text-sm text-graphite-900">
      <h2 className="font-semibold text-alarm-700">⚠ Placeholder prices: not ready to submit</h2>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {placeholders.map((p) => (
          <li key={p.itemId}>
            {p.itemName.replace(/^PLACEHOLDER /, "")} for {p.marks.join(", ")}: priced {p.basis} ({usd(p.pricePerFoot)}/ft).
          </li>
        ))}
      </ul>
      <p className="mt-1">Add these to the price book and run the takeoff again; this one cannot be submitted as the bid.</p>
    </section>
  );
}
