import { mkdir, writeFile } from "node:fs/promises";
import { randomBytes } from "node:crypto";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import type { OutboxMessage } from "@/lib/mail/outbox";

/**
 * The local SMTP stand-in: accepts any message on loopback and keeps it as two files in the outbox
 * folder — the raw .eml and a .json summary the demo outbox page and the tests read.
 */
export async function startSmtpStandIn(opts: { port: number; host?: string; dir: string }) {
  await mkdir(opts.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", async () => {
        try {
          const raw = Buffer.concat(chunks);
          const parsed = await simpleParser(raw);
          const id = `${Date.now()}-${randomBytes(4).toString("hex")}`;
          const to = session.envelope.rcptTo.map((r) => r.address);
          const summary: OutboxMessage = {
            id,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to,
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : "",
            date: new Date().toISOString(),
          };
          await writeFile(path.join(opts.dir, `${id}.eml`), raw);
          await writeFile(path.join(opts.dir, `${id}.json`), JSON.stringify(summary, null, 2));
          callback();
        } catch (error) {
          callback(error as Error);
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, opts.host ?? "127.0.0.1", () => resolve());
  });
  return { close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
