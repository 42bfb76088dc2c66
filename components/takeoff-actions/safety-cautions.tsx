/** The usual cautions for the saws, routers and nailers this list is cut with, and the deferral to codes. */
export function SafetyCautions() {
  return (
    <aside className="rounded-md border-2 border-brass-500 bg-maple-100 p-3 text-sm" aria-label="Safety">
      <p className="font-semibold">⚠ Before you cut</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        <li>Wear eye and hearing protection at the miter saw, router and nailer.</li>
        <li>Keep blade and bit guards in place; keep hands clear of the blade path and clamp short pieces.</li>
        <li>Read each tool&apos;s manual; disconnect air or power before clearing a jam or changing a blade.</li>
        <li>Lengths are to the long point of miters; check them against the opening on site before cutting.</li>
      </ul>
      <p className="mt-2 text-xs text-graphite-700">Local building codes and licensed practice govern the work; this list does not certify compliance.</p>
    </aside>
  );
}
