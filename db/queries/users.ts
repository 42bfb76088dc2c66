import { and, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { users } from "../schema";

/** Public fields only: the password hash never leaves this layer except for the credential check. */
export const publicUser = { id: users.id, name: users.name, email: users.email } as const;

/** The unique constraint a second account with the same e-mail breaks. */
export const USER_EMAIL_KEY = "users_email_key";

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

/** A new account; the password arrives already hashed. */
export async function insertUser(tx: Tx, values: { name: string; email: string; passwordHash: string }) {
  const [user] = await tx.insert(users).values(values).returning(publicUser);
  return user!;
}
