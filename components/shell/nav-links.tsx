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
    <nav aria-label="Main" className="order-last -mx-1 flex w-full gap-1 overflow-x-auto px-1 text-sm whitespace-nowrap xl:order-none xl:mx-0 xl:w-auto xl:px-0">
      {links.map((l) => {
        const active = path.startsWith(l.href);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? "page" : undefined}
            className={`shrink-0 rounded-md px-2.5 py-1.5 font-medium ${active ? "bg-maple-50 text-spruce-800" : "hover:bg-spruce-700"}`}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
