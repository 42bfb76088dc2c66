// PATCH /api/orgs/[orgSlug]/members/[memberId] — change a member's role; DELETE — remove the member
import { NextResponse } from "next/server";
import { changeMemberRole, removeMember } from "@/lib/server/members/members";
import { withOrg } from "@/lib/api/with-org";
import { parseId, readJson } from "@/lib/api/read-input";
import { changeRoleSchema } from "@/lib/validators/member";

type Params = { orgSlug: string; memberId: string };

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const membershipId = parseId(params.memberId, "member");
    const { role } = await readJson(req, changeRoleSchema);
    return NextResponse.json({ member: await changeMemberRole({ orgId: org.orgId, membershipId, role }) });
  },
  { permission: "member.write" },
);

export const DELETE = withOrg<Params>(
  async ({ params, org }) => {
    await removeMember({ orgId: org.orgId, membershipId: parseId(params.memberId, "member") });
    return new NextResponse(null, { status: 204 });
  },
  { permission: "member.write" },
);
