import { rm } from "node:fs/promises";
import { migrateDatabase } from "@/db/migrate";
import { startSmtpStandIn } from "@/scripts/stand-ins/mail/smtp-stand-in";

/**
 * Runs once before the integration suite: the test database (created fresh by `npm test`) gets the
 * migrations, and the SMTP stand-in listens so invitation e-mails really travel over SMTP.
 */
export default async function setup() {
  const url = process.env.DATABASE_URL;
  if (!url || !/_test\b/.test(url)) {
    throw new Error("Integration tests need DATABASE_URL pointing at a *_test database; run them through `npm test`.");
  }
  await migrateDatabase(url);
  const dir = process.env.OUTBOX_DIR!;
  await rm(dir, { recursive: true, force: true });
  const smtp = await startSmtpStandIn({ port: Number(process.env.SMTP_PORT), dir });
  return async () => smtp.close();
}
