/** The mark: a mitered corner of casing with a brass miter line. */
export function Logo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden>
      <rect width="32" height="32" rx="6" fill="#245840" />
      <path d="M7 25 L7 7 L25 7" fill="none" stroke="#f8f1e2" strokeWidth="4" />
      <path d="M7 7 L14 14" stroke="#d2a942" strokeWidth="2.5" />
    </svg>
  );
}
