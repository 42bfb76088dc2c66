import type { Metadata } from "next";
import { getSettings } from "@/lib/server/settings/settings";
import { requireOrg } from "@/lib/auth/page-context";
import { SettingsForm } from "./settings-client";

export const metadata: Metadata = { title: "Company settings" };

export default async function SettingsPage({ params }: { params: Promise<{ orgSlug: string }> }) {
  const { orgSlug } = await params;
  const { org, can } = await requireOrg(orgSlug);
  return <SettingsForm orgSlug={orgSlug} initial={await getSettings({ orgId: org.orgId })} canWrite={can("settings.write")} />;
}
