import { db } from "@/db/client";
import { claimInvitation } from "@/db/queries/invitations";
import { insertMembership } from "@/db/queries/memberships";
import { getUserByEmail, insertUser } from "@/db/queries/users";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { passwordProblem } from "@/lib/auth/password-policy";
import { assertNotThrottled, recordFailedAttempt, recordSuccessfulAttempt, requestAddress } from "@/lib/auth/throttle";
import { AppError, conflict, gone, toAppError } from "@/lib/errors";
import { describeInvitation } from "./invitations";

type AcceptInput = { token: string; name?: string; password: string };

/**
 * Redeems an invitation link for the caller at these request headers. Accepting checks an existing
 * account's password (or sets a new one), so it shares sign-in's limiter: wrong links count against the
 * address, wrong passwords against the invited account too.
 */
export async function redeemInvitation(input: AcceptInput, headers: Headers) {
  const address = requestAddress(headers);
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
    return joined;
  } catch (error) {
    if (toAppError(error)?.fields?.password) await recordFailedAttempt(subject);
    throw error;
  }
}

/**
 * Accepts an invitation: a new person gets an account; an existing one proves it with their password.
 * The used-at stamp is set in the same transaction with a guard, so a link works exactly once.
 */
export async function acceptInvitation(args: AcceptInput) {
  const invite = await describeInvitation(args.token);
  const existing = await getUserByEmail(invite.email);
  if (existing) {
    if (!(await verifyPassword(args.password, existing.passwordHash))) {
      throw new AppError(422, "That password does not match your existing account.", { password: "Wrong password for this account." });
    }
  } else if (!args.name) {
    throw new AppError(422, "Tell us your name.", { name: "Name is required." });
  }
  const passwordHash = existing ? null : await hashPassword(args.password);

  return db.transaction(async (tx) => {
    if (!(await claimInvitation(tx, invite.id))) {
      // Replaced or withdrawn between the look-up and now: say which, as the look-up would.
      await describeInvitation(args.token);
      throw gone("This invitation has already been used. Sign in instead.");
    }
    const userId = existing?.id ?? (await insertUser(tx, { name: args.name!, email: invite.email, passwordHash: passwordHash! })).id;
    // Rolled back with the claim, so the link stays unused rather than "accepted" to no effect.
    if (!(await insertMembership(tx, { orgId: invite.orgId, userId, role: invite.role }))) {
      throw conflict(`You are already a member of ${invite.orgName}. Sign in to continue.`);
    }
    return { email: invite.email, orgSlug: invite.orgSlug, role: invite.role };
  });
}
