// The local SMTP stand-in as a process: `npm run demo` and the browser tests start it beside the app.
import { startSmtpStandIn } from "@/scripts/stand-ins/mail/smtp-stand-in";

const port = Number(process.env.SMTP_PORT ?? 2525);
const dir = process.env.OUTBOX_DIR ?? ".data/outbox";
await startSmtpStandIn({ port, dir });
console.log(`SMTP stand-in on 127.0.0.1:${port}, keeping mail in ${dir}`);
