import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { requireUser } from "@/lib/auth/page-context";
import { roleLabels } from "@/lib/permissions";
import { organisationsOf } from "@/lib/server/accounts/organisations";
import { Logo } from "@/components/logo";

export const metadata: Metadata = { title: "Your organisations" };

export default async function OrganisationsPage() {
  const user = await requireUser("/orgs");
  const orgs = await organisationsOf(user.id);
  if (orgs.length === 1) redirect(`/${orgs[0]!.slug}/projects`);
  return (
    <main className="mx-auto max-w-lg px-6 py-12">
      <div className="mb-6 flex items-center gap-2 text-lg font-bold text-spruce-800">
        <Logo /> Miterwise
      </div>
      <h1 className="text-xl font-bold">Choose an organisation</h1>
      {orgs.length === 0 ? (
        <p className="mt-3 text-sm text-graphite-700">You are not a member of any organisation yet. Ask an admin for an invitation.</p>
      ) : (
        <ul className="mt-4 divide-y divide-maple-200 rounded-lg border border-maple-200 bg-white">
          {orgs.map((o) => (
            <li key={o.slug}>
              <Link href={`/${o.slug}/projects`} className="flex justify-between px-4 py-3 hover:bg-maple-100">
                <span className="font-medium">{o.name}</span>
                <span className="text-sm text-graphite-600">{roleLabels[o.role]}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </main>
  );
}
