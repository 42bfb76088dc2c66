// GET /api/orgs/[orgSlug]/members — the organisation's members and their roles
import { NextResponse } from "next/server";
import { listMembers } from "@/db/queries/memberships";
import { withOrg } from "@/lib/api/with-org";

export const GET = withOrg(async ({ org }) => NextResponse.json({ members: await listMembers({ orgId: org.orgId }) }), {
  permission: "member.read",
});
