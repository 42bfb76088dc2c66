// POST /api/signup — create an account, its organisation and the admin membership
import { NextResponse } from "next/server";
import { publicRoute } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { signUp } from "@/lib/server/accounts/sign-up";
import { signUpSchema } from "@/lib/validators/user";

export const POST = publicRoute(async ({ req }) => {
  const { user, organisation } = await signUp(await readJson(req, signUpSchema));
  return NextResponse.json({ user, organisation }, { status: 201 });
});
