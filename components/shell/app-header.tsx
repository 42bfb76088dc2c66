import Link from "next/link";
import type { Role } from "@/db/schema";
import { roleLabels } from "@/lib/permissions";
import { Logo } from "@/components/logo";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

type OrgChoice = { slug: string; name: string; role: Role };

export function AppHeader({ org, orgs, userName }: { org: OrgChoice; orgs: OrgChoice[]; userName: string }) {
  return (
    <header className="border-b border-spruce-900 bg-spruce-800 text-maple-50">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href={`/${org.slug}/projects`} className="flex items-center gap-2 font-bold">
          <Logo className="h-6 w-6" /> Miterwise
        </Link>
        <details className="relative">
          <summary className="cursor-pointer list-none rounded-md px-2 py-1 text-sm hover:bg-spruce-700" aria-label="Switch organisation">
            <span className="font-semibold">{org.name}</span> <span className="text-maple-200">· {roleLabels[org.role]} ▾</span>
          </summary>
          <ul className="absolute z-10 mt-1 min-w-64 rounded-md border border-maple-200 bg-white py-1 text-graphite-900 shadow-lg">
            {orgs.map((o) => (
              <li key={o.slug}>
                <Link href={`/${o.slug}/projects`} className="flex justify-between gap-4 px-3 py-2 text-sm hover:bg-maple-100">
                  <span>
                    {o.slug === org.slug ? "✓ " : ""}
                    {o.name}
                  </span>
                  <span className="text-graphite-600">{roleLabels[o.role]}</span>
                </Link>
              </li>
            ))}
          </ul>
        </details>
        <NavLinks orgSlug={org.slug} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span className="text-maple-200">{userName}</span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
