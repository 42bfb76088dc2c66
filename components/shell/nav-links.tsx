"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

export function NavLinks({ orgSlug }: { orgSlug: string }) {
  const path = usePathname();
  const links = [
    { href: `/${orgSlug}/projects`, label: "Projects" },
    { href: `/${orgSlug}/price-books`, label: "Price books" },
    { href: `/${orgSlug}/compare`, label: "Compare" },
    { href: `/${orgSlug}/members`, label: "Members" },
    { href: `/${orgSlug}/settings`, label: "Settings" },
  ];
  return (
    <nav aria-label="Main" className="flex gap-1 text-sm">
      {links.map((l) => {
        const active = path.startsWith(l.href);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? "page" : undefined}
            className={`rounded-md px-3 py-1.5 font-medium ${active ? "bg-maple-50 text-spruce-800" : "hover:bg-spruce-700"}`}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
