import type { Metadata } from "next";
import { requireOrg } from "@/lib/auth/page-context";
import { MembersView } from "./members-client";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ orgSlug: string }> }) {
  const { orgSlug } = await params;
  const { user, can } = await requireOrg(orgSlug);
  return <MembersView orgSlug={orgSlug} canManage={can("member.write")} currentUserId={user.id} />;
}
