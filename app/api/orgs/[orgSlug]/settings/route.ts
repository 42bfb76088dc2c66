// GET /api/orgs/[orgSlug]/settings — the company's trim defaults, kerf and waste allowance; PATCH — change them (admins)
import { NextResponse } from "next/server";
import { getSettings, updateSettings } from "@/lib/server/settings/settings";
import { withOrg } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { settingsSchema } from "@/lib/validators/settings";

export const GET = withOrg(async ({ org }) => NextResponse.json({ settings: await getSettings({ orgId: org.orgId }) }), {
  permission: "settings.read",
});

export const PATCH = withOrg(
  async ({ req, org }) => NextResponse.json({ settings: await updateSettings({ orgId: org.orgId }, await readJson(req, settingsSchema)) }),
  { permission: "settings.write" },
);
