// POST /api/signup — create an account, its organisation and the admin membership
import { NextResponse } from "next/server";
import { signUpUser } from "@/db/queries/users";
import { isUniqueViolation } from "@/db/errors";
import { publicRoute } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { conflict } from "@/lib/errors";
import { signUpSchema } from "@/lib/validators/user";

export const POST = publicRoute(async ({ req }) => {
  const input = await readJson(req, signUpSchema);
  try {
    const { user, organisation } = await signUpUser(input);
    return NextResponse.json({ user, organisation }, { status: 201 });
  } catch (error) {
    // Two sign-ups racing for one e-mail: the loser gets the same answer as a plain duplicate.
    if (isUniqueViolation(error, "users_email_key")) {
      throw conflict("An account with this e-mail already exists. Sign in instead.", {
        email: "An account with this e-mail already exists.",
      });
    }
    throw error;
  }
});
