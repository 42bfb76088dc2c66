// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/sends — when the bid was e-mailed, to whom; POST — e-mail it now
import { NextResponse } from "next/server";
import { bidDocument, listSends, recordSend } from "@/db/queries/takeoff-documents";
import { getUserById } from "@/db/queries/users";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson } from "@/lib/api/read-input";
import { AppError } from "@/lib/errors";
import { sendMail } from "@/lib/mail/transport";
import { bidMail } from "@/lib/takeoffs/bid-mail";
import { downloadName } from "@/lib/takeoffs/download-name";
import { sendBidSchema } from "@/lib/validators/takeoff";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ sends: await listSends(projectScope(org, params), parseId(params.takeoffId, "takeoff")) }),
  { permission: "takeoff.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    const id = parseId(params.takeoffId, "takeoff");
    const input = await readJson(req, sendBidSchema);
    const { takeoff, project, bytes } = await bidDocument(scope, id);
    const sender = await getUserById(org.userId);
    const mail = bidMail({ to: input.to, orgName: org.orgName, projectName: project.name, senderName: sender?.name ?? org.orgName, message: input.message ?? null, total: takeoff.result.bid.total });
    try {
      await sendMail({ ...mail, attachments: [{ filename: downloadName(takeoff.name, "bid", "pdf"), content: Buffer.from(bytes), contentType: "application/pdf" }] });
    } catch (error) {
      console.error(error);
      throw new AppError(503, "The e-mail could not be sent, and nothing was recorded. Try again shortly.");
    }
    await recordSend(scope, id, input.to, mail.subject);
    return NextResponse.json({ sent: { to: input.to, subject: mail.subject } }, { status: 201 });
  },
  { permission: "takeoff.submit" },
);
