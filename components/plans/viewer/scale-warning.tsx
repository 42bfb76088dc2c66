/** The server's 1% flag: picked points and the chosen scale disagree. Icon and words, not colour alone. */
export function ScaleWarning({ percent }: { percent: number }) {
  return (
    <p role="status" className="flex gap-2 rounded-md border border-brass-500 bg-maple-100 px-2 py-1.5 text-xs text-graphite-900">
      <svg viewBox="0 0 16 16" className="mt-0.5 h-4 w-4 shrink-0" aria-hidden>
        <path d="M8 1.5 15 14.5H1Z" fill="#e3c372" stroke="#7a5e17" strokeWidth="1.2" strokeLinejoin="round" />
        <path d="M8 6v4.2M8 11.8v.4" stroke="#1f2225" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      <span>
        <strong>Scale mismatch: {percent.toFixed(1)}%.</strong> The picked points and the chosen scale disagree by more than 1%. The
        points are used; check the scale printed on the sheet, or pick the points again.
      </span>
    </p>
  );
}
