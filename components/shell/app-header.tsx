import Link from "next/link";
import { Check, ChevronDown } from "lucide-react";
import type { Role } from "@/db/schema";
import { roleLabels } from "@/lib/permissions";
import { Logo } from "@/components/logo";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

type OrgChoice = { slug: string; name: string; role: Role };

export function AppHeader({ org, orgs, userName }: { org: OrgChoice; orgs: OrgChoice[]; userName: string }) {
  return (
    <header className="border-b border-spruce-900 bg-spruce-800 text-maple-50">
      {/* One row from 1280 px for every role (long names truncate); on a phone the navigation takes a scrolling row of its own. */}
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3 sm:px-6 xl:flex-nowrap">
        <Link href={`/${org.slug}/projects`} className="flex shrink-0 items-center gap-2 font-bold">
          <Logo className="h-6 w-6" /> Miterwise
        </Link>
        <details className="relative min-w-0">
          <summary className="flex cursor-pointer list-none items-center gap-1 rounded-md px-2 py-1 text-sm whitespace-nowrap hover:bg-spruce-700" aria-label="Switch organisation" title={`${org.name} · ${roleLabels[org.role]}`}>
            <span className="max-w-[11rem] truncate font-semibold xl:max-w-[13rem]">{org.name}</span>
            <span className="text-maple-200">· {roleLabels[org.role]}</span>
            <ChevronDown aria-hidden className="size-3.5 text-maple-200" />
          </summary>
          <ul className="absolute z-10 mt-1 min-w-64 rounded-md border border-maple-200 bg-white py-1 text-graphite-900 shadow-lg">
            {orgs.map((o) => (
              <li key={o.slug}>
                <Link href={`/${o.slug}/projects`} className="flex justify-between gap-4 px-3 py-2 text-sm hover:bg-maple-100">
                  <span>
                    {o.slug === org.slug && <Check aria-hidden className="mr-1 inline size-3.5 align-[-0.125em]" />}
                    {o.name}
                  </span>
                  <span className="text-graphite-600">{roleLabels[o.role]}</span>
                </Link>
              </li>
            ))}
          </ul>
        </details>
        <NavLinks orgSlug={org.slug} />
        <div className="ml-auto flex shrink-0 items-center gap-3 text-sm">
          <span className="hidden max-w-[8rem] truncate text-maple-200 sm:inline" title={userName}>
            {userName}
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
