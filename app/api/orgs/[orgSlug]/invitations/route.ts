// GET /api/orgs/[orgSlug]/invitations — pending invitations; POST — invite someone by e-mail with a role (replacing a pending one to that address)
import { NextResponse } from "next/server";
import { createInvitation, listPendingInvitations, withdrawUnsentInvitation } from "@/db/queries/invitations";
import { getUserById } from "@/db/queries/users";
import { withOrg } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { AppError } from "@/lib/errors";
import { inviteMail } from "@/lib/mail/invite-mail";
import { sendMail } from "@/lib/mail/transport";
import { inviteSchema } from "@/lib/validators/member";

export const GET = withOrg(
  async ({ org }) => NextResponse.json({ invitations: await listPendingInvitations({ orgId: org.orgId }) }),
  { permission: "member.write" },
);

export const POST = withOrg(
  async ({ req, org }) => {
    const { email, role } = await readJson(req, inviteSchema);
    const { invitation, token, replaced } = await createInvitation({ orgId: org.orgId, invitedBy: org.userId, email, role });
    const inviter = await getUserById(org.userId);
    try {
      await sendMail(inviteMail({ to: email, orgName: org.orgName, inviterName: inviter?.name ?? "An admin", role, token }));
    } catch (error) {
      // An invitation nobody received must not linger as pending, nor push out the one it replaced.
      console.error(error);
      await withdrawUnsentInvitation({ orgId: org.orgId, invitationId: invitation.id });
      throw new AppError(503, "The invitation e-mail could not be sent, so no invitation was made. Try again shortly.");
    }
    return NextResponse.json({ invitation, replaced }, { status: 201 });
  },
  { permission: "member.write" },
);
