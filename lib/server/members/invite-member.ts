import { withdrawUnsentInvitation } from "@/db/queries/invitations";
import { getUserById } from "@/db/queries/users";
import type { OrgContext } from "@/db/queries/memberships";
import type { Role } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { inviteMail } from "@/lib/mail/invite-mail";
import { sendMail } from "@/lib/mail/transport";
import { createInvitation } from "./invitations";

/** Invites someone by e-mail with a role (replacing a pending invitation to that address) and sends the link. */
export async function inviteMember(org: OrgContext, { email, role }: { email: string; role: Role }) {
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
  return { invitation, replaced };
}
