// GET /api/orgs/[orgSlug]/invitations — pending invitations; POST — invite someone by e-mail with a role (replacing a pending one to that address)
import { NextResponse } from "next/server";
import { withOrg } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { pendingInvitationsOf } from "@/lib/server/members/invitations";
import { inviteMember } from "@/lib/server/members/invite-member";
import { inviteSchema } from "@/lib/validators/member";

export const GET = withOrg(
  async ({ org }) => NextResponse.json({ invitations: await pendingInvitationsOf({ orgId: org.orgId }) }),
  { permission: "member.write" },
);

export const POST = withOrg(
  async ({ req, org }) => NextResponse.json(await inviteMember(org, await readJson(req, inviteSchema)), { status: 201 }),
  { permission: "member.write" },
);
