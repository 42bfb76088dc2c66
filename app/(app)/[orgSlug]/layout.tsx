import type { ReactNode } from "react";
import { requireOrg } from "@/lib/auth/page-context";
import { organisationsOf } from "@/lib/server/accounts/organisations";
import { AppHeader } from "@/components/shell/app-header";

export default async function OrgLayout({ children, params }: { children: ReactNode; params: Promise<{ orgSlug: string }> }) {
  const { orgSlug } = await params;
  const { user, org } = await requireOrg(orgSlug);
  const orgs = await organisationsOf(user.id);
  return (
    <div className="min-h-screen">
      <AppHeader org={{ slug: org.orgSlug, name: org.orgName, role: org.role }} orgs={orgs} userName={user.name} />
      <main className="mx-auto max-w-6xl px-4 py-6 sm:px-6">{children}</main>
    </div>
  );
}
