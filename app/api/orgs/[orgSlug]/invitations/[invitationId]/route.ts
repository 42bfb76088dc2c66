// DELETE /api/orgs/[orgSlug]/invitations/[invitationId] — withdraw a pending invitation
import { NextResponse } from "next/server";
import { revokeInvitation } from "@/lib/server/members/invitations";
import { withOrg } from "@/lib/api/with-org";
import { parseId } from "@/lib/api/read-input";

type Params = { orgSlug: string; invitationId: string };

export const DELETE = withOrg<Params>(
  async ({ params, org }) => {
    await revokeInvitation({ orgId: org.orgId, invitationId: parseId(params.invitationId, "invitation") });
    return new NextResponse(null, { status: 204 });
  },
  { permission: "member.write" },
);
