import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { env } from "@/lib/env";
import { signInSchema } from "@/lib/validators/user";
import { getUserByEmail } from "@/db/queries/users";
import { blockedUntil, clearSignInFailures, recordSignInFailure, type ThrottleKey } from "@/db/queries/sign-in-throttle";
import { burnPasswordCheck, verifyPassword } from "./password";

export const SIGN_IN_FAILED = "Wrong e-mail or password.";

function clientAddress(headers: Record<string, unknown> | Headers | undefined): string {
  const get = (name: string) =>
    headers instanceof Headers ? headers.get(name) : (headers?.[name] as string | undefined);
  return (get("x-forwarded-for") ?? "").split(",")[0]?.trim() || get("x-real-ip") || "unknown";
}

/** Checks e-mail + password, with throttling per account and per address. Exported for tests. */
export async function authorizeCredentials(raw: unknown, address: string) {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) throw new Error(SIGN_IN_FAILED);
  const { email, password } = parsed.data;
  const keys: ThrottleKey[] = [
    { kind: "email", value: email },
    { kind: "ip", value: address },
  ];
  const until = await blockedUntil(keys);
  if (until) {
    const minutes = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 60_000));
    throw new Error(`Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
  }
  const user = await getUserByEmail(email);
  const ok = user ? await verifyPassword(password, user.passwordHash) : await burnPasswordCheck(password);
  if (!user || !ok) {
    await recordSignInFailure(keys);
    throw new Error(SIGN_IN_FAILED);
  }
  await clearSignInFailures({ kind: "email", value: email });
  return { id: user.id, name: user.name, email: user.email };
}

export const authOptions: NextAuthOptions = {
  secret: env.NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (credentials, req) => authorizeCredentials(credentials, clientAddress(req?.headers)),
    }),
  ],
  callbacks: {
    // The token carries only who you are; roles are read from the membership on every request.
    jwt: ({ token, user }) => (user ? { ...token, sub: user.id, name: user.name, email: user.email } : token),
    session: ({ session, token }) => ({ ...session, user: { id: token.sub!, name: token.name, email: token.email } }),
  },
};
