import { z } from "zod";

/**
 * Every setting the server reads, validated once at start-up. Defaults point at the local stand-ins
 * (private PostgreSQL on loopback, the SMTP stand-in) so the demo needs no configuration; production
 * overrides them with environment variables (see README, "Beyond one machine").
 */
const schema = z.object({
  DATABASE_URL: z.string().url().default("postgres://miterwise@127.0.0.1:54329/miterwise"),
  NEXTAUTH_URL: z.string().url().default("http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z.string().min(16).default("miterwise-local-demo-secret-change-me"),
  // A real provider: smtp(s)://user:pass@host:port. Unset means the local stand-in below.
  SMTP_URL: z.string().url().optional(),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_FROM: z.string().default("Miterwise <no-reply@miterwise.invalid>"),
  MITERWISE_DATA_DIR: z.string().default(".data"),
  // Where the SMTP stand-in keeps messages; the demo outbox page reads it.
  OUTBOX_DIR: z.string().optional(),
});

export type Env = z.infer<typeof schema>;

function load(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Invalid environment:\n${lines}`);
  }
  return parsed.data;
}

export const env = load();

export const outboxDir = () => env.OUTBOX_DIR ?? `${env.MITERWISE_DATA_DIR}/outbox`;

/** The outbox page exists only while mail goes to the local stand-in (demo and tests). */
export const usesMailStandIn = () => !env.SMTP_URL;
