// GET /api/orgs/[orgSlug]/members — the organisation's members and their roles
import { NextResponse } from "next/server";
import { membersOf } from "@/lib/server/members/members";
import { withOrg } from "@/lib/api/with-org";

export const GET = withOrg(async ({ org }) => NextResponse.json({ members: await membersOf({ orgId: org.orgId }) }), {
  permission: "member.read",
});
