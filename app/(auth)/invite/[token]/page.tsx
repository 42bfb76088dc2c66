import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/card";
import { toAppError } from "@/lib/errors";
import { roleLabels } from "@/lib/permissions";
import { describeInvitation } from "@/lib/server/members/invitations";
import { AcceptInviteForm } from "./invite-client";

export const metadata: Metadata = { title: "Join your team" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let invite;
  try {
    invite = await describeInvitation(token);
  } catch (error) {
    const known = toAppError(error);
    if (!known) throw error;
    return (
      <div className="space-y-4">
        <h1 className="text-xl font-bold">This invitation cannot be used</h1>
        <Notice tone="error">{known.message}</Notice>
        <Link href="/sign-in" className="text-sm font-semibold text-spruce-700 underline">
          Go to sign in
        </Link>
      </div>
    );
  }
  return (
    <div className="space-y-4">
      <h1 className="text-xl font-bold">Join {invite.orgName}</h1>
      <p className="text-sm text-graphite-700">
        You were invited as <strong>{roleLabels[invite.role]}</strong> with the e-mail <strong>{invite.email}</strong>.
      </p>
      <AcceptInviteForm token={token} email={invite.email} hasAccount={invite.hasAccount} />
    </div>
  );
}
