import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { env } from "@/lib/env";
import { signInSchema } from "@/lib/validators/user";
import { bumpSessionVersion, getUserByEmail } from "@/db/queries/users";
import { burnPasswordCheck, verifyPassword } from "./password";
import { assertNotThrottled, recordFailedAttempt, recordSuccessfulAttempt, requestAddress } from "./throttle";

export const SIGN_IN_FAILED = "Wrong e-mail or password.";

/** Checks e-mail + password from `address`, throttled per account, per address and per pair. Exported for tests. */
export async function authorizeCredentials(raw: unknown, address: string) {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) throw new Error(SIGN_IN_FAILED);
  const { email, password } = parsed.data;
  const subject = { account: email, address };
  await assertNotThrottled(subject);
  const user = await getUserByEmail(email);
  const ok = user ? await verifyPassword(password, user.passwordHash) : await burnPasswordCheck(password);
  if (!user || !ok) {
    await recordFailedAttempt(subject);
    throw new Error(SIGN_IN_FAILED);
  }
  await recordSuccessfulAttempt(subject);
  return { id: user.id, name: user.name, email: user.email, sessionVersion: user.sessionVersion };
}

export const authOptions: NextAuthOptions = {
  secret: env.NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (credentials, req) => authorizeCredentials(credentials, requestAddress(req?.headers)),
    }),
  ],
  callbacks: {
    // The token carries who you are and the session version it was issued under; roles are read from the
    // membership on every request, on the same read that checks the version.
    jwt: ({ token, user }) =>
      user
        ? { ...token, sub: user.id, name: user.name, email: user.email, sv: (user as { sessionVersion?: number }).sessionVersion ?? 0 }
        : token,
    session: ({ session, token }) => ({ ...session, user: { id: token.sub!, name: token.name, email: token.email } }),
  },
  events: {
    // Signing out ends the session everywhere, so a copied cookie stops working too.
    signOut: async ({ token }) => {
      if (token?.sub) await bumpSessionVersion(token.sub);
    },
  },
};
