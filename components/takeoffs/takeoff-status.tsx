/** Draft or submitted, as a word and a mark: the submitted one is the bid that went out, so it stands out. */
export function TakeoffStatus({ status }: { status: "draft" | "submitted" }) {
  if (status === "submitted") {
    return (
      <span className="inline-flex items-center gap-1 rounded-full border border-spruce-600 bg-spruce-50 px-2 py-0.5 text-xs font-semibold text-spruce-800">
        {/* A sealed envelope: our own mark for "this went out as the bid". */}
        <svg viewBox="0 0 16 16" className="h-3.5 w-3.5" aria-hidden fill="none" stroke="currentColor" strokeWidth="1.5">
          <rect x="1.5" y="3.5" width="13" height="9" rx="1" />
          <path d="M1.5 4.5 8 9l6.5-4.5" />
          <circle cx="12.5" cy="11.5" r="2.5" fill="currentColor" stroke="none" />
        </svg>
        Submitted
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-1 rounded-full border border-maple-300 bg-maple-100 px-2 py-0.5 text-xs font-medium text-graphite-700">
      <svg viewBox="0 0 16 16" className="h-3.5 w-3.5" aria-hidden fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="2 2">
        <circle cx="8" cy="8" r="5.5" />
      </svg>
      Draft
    </span>
  );
}
