import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

let transporter: Transporter | undefined;

/**
 * A real provider when SMTP_URL is set; otherwise the local stand-in on loopback, which speaks plain
 * SMTP without TLS (it never leaves the machine).
 */
function transport(): Transporter {
  transporter ??= env.SMTP_URL
    ? nodemailer.createTransport(env.SMTP_URL)
    : nodemailer.createTransport({ host: env.SMTP_HOST, port: env.SMTP_PORT, secure: false, ignoreTLS: true });
  return transporter;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export async function sendMail(mail: Mail) {
  await transport().sendMail({ from: env.MAIL_FROM, ...mail });
}
