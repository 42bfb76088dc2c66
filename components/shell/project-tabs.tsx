"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

/** Overview · Plans · Window list. The sheet viewer counts as part of Plans. */
export function ProjectTabs({ base }: { base: string }) {
  const path = usePathname();
  const tabs = [
    { href: base, label: "Overview", active: path === base },
    { href: `${base}/plans`, label: "Plans", active: path.startsWith(`${base}/plans`) || path.startsWith(`${base}/sheets`) },
    { href: `${base}/openings`, label: "Window list", active: path.startsWith(`${base}/openings`) },
    { href: `${base}/takeoffs`, label: "Takeoffs", active: path.startsWith(`${base}/takeoffs`) },
  ];
  return (
    <nav className="flex gap-1 overflow-x-auto border-b border-maple-200 whitespace-nowrap" aria-label="Project sections">
      {tabs.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.active ? "page" : undefined}
          className={`-mb-px shrink-0 border-b-2 px-3 py-2 text-sm font-medium ${
            t.active ? "border-brass-500 text-graphite-900" : "border-transparent text-graphite-600 hover:text-graphite-900"
          }`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
