import { and, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { memberships, organisations, users } from "../schema";
import { slugify, slugSuffix } from "@/lib/slug";
import { conflict } from "@/lib/errors";
import { hashPassword } from "@/lib/auth/password";
import type { SignUpInput } from "@/lib/validators/user";

/** Public fields only: the password hash never leaves this layer except for the credential check. */
export const publicUser = { id: users.id, name: users.name, email: users.email } as const;

export async function getUserByEmail(email: string, tx: Tx = db) {
  const [row] = await tx.select().from(users).where(eq(users.email, email.toLowerCase())).limit(1);
  return row ?? null;
}

export async function getUserById(id: string, tx: Tx = db) {
  const [row] = await tx.select(publicUser).from(users).where(eq(users.id, id)).limit(1);
  return row ?? null;
}

/** The signed-in person, if the session's version is still theirs (sign-out and password changes move it on). */
export async function getSessionUser(session: { userId: string; sessionVersion: number }, tx: Tx = db) {
  const [row] = await tx
    .select(publicUser)
    .from(users)
    .where(and(eq(users.id, session.userId), eq(users.sessionVersion, session.sessionVersion)))
    .limit(1);
  return row ?? null;
}

/** Ends every session of this person: cookies issued before carry an older version and stop working. */
export async function bumpSessionVersion(userId: string, tx: Tx = db) {
  await tx
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
}

/** Picks a slug nobody has: the plain one if free, else with a short random suffix. */
export async function uniqueOrgSlug(name: string, tx: Tx = db): Promise<string> {
  const base = slugify(name);
  for (let attempt = 0; attempt < 5; attempt++) {
    const slug = attempt === 0 ? base : `${base}-${slugSuffix()}`;
    const taken = await tx.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, slug));
    if (taken.length === 0) return slug;
  }
  throw conflict("Could not choose an address for the organisation; try another name.");
}

/** Sign-up: the person, their organisation, and their admin membership, all or nothing. */
export async function signUpUser(input: SignUpInput) {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    if (await getUserByEmail(input.email, tx)) {
      throw conflict("An account with this e-mail already exists. Sign in instead.", {
        email: "An account with this e-mail already exists.",
      });
    }
    const [user] = await tx
      .insert(users)
      .values({ name: input.name, email: input.email, passwordHash })
      .returning(publicUser);
    const slug = await uniqueOrgSlug(input.organisationName, tx);
    const [org] = await tx
      .insert(organisations)
      .values({ name: input.organisationName, slug })
      .returning({ id: organisations.id, slug: organisations.slug, name: organisations.name });
    await tx.insert(memberships).values({ orgId: org!.id, userId: user!.id, role: "admin" });
    return { user: user!, organisation: org! };
  });
}
