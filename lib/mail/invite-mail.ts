import { env } from "@/lib/env";
import { roleLabels } from "@/lib/permissions";
import type { Role } from "@/db/schema";
import { escapeHtml } from "./escape-html";
import type { Mail } from "./transport";

export const inviteLink = (token: string) => `${env.NEXTAUTH_URL.replace(/\/$/, "")}/invite/${token}`;

export function inviteMail(args: { to: string; orgName: string; inviterName: string; role: Role; token: string }): Mail {
  const link = inviteLink(args.token);
  const role = roleLabels[args.role];
  const subject = `${args.inviterName} invited you to ${args.orgName} on Miterwise`;
  const text = [
    `${args.inviterName} invited you to join ${args.orgName} on Miterwise as ${role}.`,
    "",
    `Accept the invitation: ${link}`,
    "",
    "The link works once and expires in 7 days. If you did not expect this, ignore this e-mail.",
  ].join("\n");
  const html = `<p>${escapeHtml(args.inviterName)} invited you to join <strong>${escapeHtml(args.orgName)}</strong> on Miterwise as ${role}.</p>
<p><a href="${link}">Accept the invitation</a></p>
<p>The link works once and expires in 7 days. If you did not expect this, ignore this e-mail.</p>`;
  return { to: args.to, subject, text, html };
}
