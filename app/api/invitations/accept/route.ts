// POST /api/invitations/accept — redeem an invitation link: new account or existing one, then membership
import { NextResponse } from "next/server";
import { acceptInvitation, describeInvitation } from "@/db/queries/invitations";
import { publicRoute } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { assertNotThrottled, recordFailedAttempt, recordSuccessfulAttempt, requestAddress } from "@/lib/auth/throttle";
import { passwordProblem } from "@/lib/auth/password-policy";
import { AppError, toAppError } from "@/lib/errors";
import { acceptInviteSchema } from "@/lib/validators/member";

export const POST = publicRoute(async ({ req }) => {
  const input = await readJson(req, acceptInviteSchema);
  // Accepting checks an existing account's password (or sets a new one), so it shares sign-in's limiter:
  // wrong links count against the address, wrong passwords against the invited account too.
  const address = requestAddress(req.headers);
  await assertNotThrottled({ account: null, address });
  const invite = await describeInvitation(input.token).catch(async (error: unknown) => {
    if (toAppError(error)?.status === 404) await recordFailedAttempt({ account: null, address });
    throw error;
  });
  const subject = { account: invite.email, address };
  await assertNotThrottled(subject);
  if (!invite.hasAccount) {
    const problem = passwordProblem(input.password, invite.email);
    if (problem) throw new AppError(422, problem, { password: problem });
  }
  try {
    const joined = await acceptInvitation(input);
    await recordSuccessfulAttempt(subject);
    return NextResponse.json(joined, { status: 200 });
  } catch (error) {
    if (toAppError(error)?.fields?.password) await recordFailedAttempt(subject);
    throw error;
  }
});
