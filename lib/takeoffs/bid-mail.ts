import { escapeHtml } from "@/lib/mail/escape-html";
import type { Mail } from "@/lib/mail/transport";
import { usd } from "./format";


export function bidMail(a: { to: string; orgName: string; projectName: string; senderName: string; message: string | null; total: number }): Omit<Mail, "attachments"> {
  const subject = `Window trim bid — ${a.projectName} — ${a.orgName}`;
  const lines = [
    a.message ?? `Please find our interior window trim bid for ${a.projectName} attached.`,
    "",
    `Bid total: ${usd(a.total)}. Scope, exclusions, assumptions and validity are in the attached summary.`,
    "",
    a.senderName,
    a.orgName,
  ];
  return {
    to: a.to,
    subject,
    text: lines.join("\n"),
    html: lines.map((l) => (l ? `<p>${escapeHtml(l)}</p>` : "")).join("\n"),
  };
}
