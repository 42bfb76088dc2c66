import { db } from "@/db/client";
import { isUniqueViolation } from "@/db/errors";
import { insertMembership } from "@/db/queries/memberships";
import { insertOrganisation } from "@/db/queries/organisations";
import { getUserByEmail, insertUser, USER_EMAIL_KEY } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { conflict } from "@/lib/errors";
import type { SignUpInput } from "@/lib/validators/user";
import { uniqueOrgSlug } from "./org-slug";

const taken = () =>
  conflict("An account with this e-mail already exists. Sign in instead.", {
    email: "An account with this e-mail already exists.",
  });

/** Sign-up: the person, their organisation, and their admin membership, all or nothing. */
export async function signUp(input: SignUpInput) {
  const passwordHash = await hashPassword(input.password);
  try {
    return await db.transaction(async (tx) => {
      if (await getUserByEmail(input.email, tx)) throw taken();
      const user = await insertUser(tx, { name: input.name, email: input.email, passwordHash });
      const organisation = await insertOrganisation(tx, { name: input.organisationName, slug: await uniqueOrgSlug(input.organisationName, tx) });
      await insertMembership(tx, { orgId: organisation.id, userId: user.id, role: "admin" });
      return { user, organisation };
    });
  } catch (error) {
    // Two sign-ups racing for one e-mail: the loser gets the same answer as a plain duplicate.
    throw isUniqueViolation(error, USER_EMAIL_KEY) ? taken() : error;
  }
}
