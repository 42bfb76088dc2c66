import type { ProjectScope } from "@/db/queries/project-scope";
import { insertSend, listSendRows } from "@/db/queries/takeoff-documents";
import { getUserById } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { sendMail } from "@/lib/mail/transport";
import { bidMail } from "@/lib/takeoffs/bid-mail";
import { downloadName } from "@/lib/takeoffs/download-name";
import { bidDocument } from "./bid-document";
import { getTakeoff } from "./takeoffs";

type Sender = ProjectScope & { userId: string; orgName: string };

/**
 * E-mails the bid summary to the general contractor and records the send. A send that fails records
 * nothing (503), so the list of sends never claims a bid went out that did not.
 */
export async function sendBid(s: Sender, takeoffId: string, input: { to: string; message?: string | null }) {
  const { takeoff, project, bytes } = await bidDocument(s, takeoffId);
  const sender = await getUserById(s.userId);
  const mail = bidMail({ to: input.to, orgName: s.orgName, projectName: project.name, senderName: sender?.name ?? s.orgName, message: input.message ?? null, total: takeoff.result.bid.total });
  try {
    await sendMail({ ...mail, attachments: [{ filename: downloadName(takeoff.name, "bid", "pdf"), content: Buffer.from(bytes), contentType: "application/pdf" }] });
  } catch (error) {
    console.error(error);
    throw new AppError(503, "The e-mail could not be sent, and nothing was recorded. Try again shortly.");
  }
  await insertSend(s.orgId, { takeoffId, to: input.to, subject: mail.subject, sentBy: s.userId });
  return { to: input.to, subject: mail.subject };
}

export async function listSends(s: ProjectScope, takeoffId: string) {
  await getTakeoff(s, takeoffId);
  return listSendRows(s.orgId, takeoffId);
}
