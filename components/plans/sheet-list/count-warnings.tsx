import type { CountWarning } from "@/lib/plans/api-types";

/** The counts' warnings in one place above the sheets, so a doubled unit plan is seen before a takeoff runs. */
export function CountWarnings({ warnings }: { warnings: CountWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <section aria-label="Count warnings" className="rounded-md border border-brass-500 bg-maple-100 px-4 py-3 text-sm text-graphite-900">
      <h2 className="font-semibold">
        <span aria-hidden>△ </span>Check the counts before a takeoff
      </h2>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {warnings.map((w) => (
          <li key={`${w.kind}-${w.sheetIds.join()}`}>{w.message}</li>
        ))}
      </ul>
    </section>
  );
}
