// POST /api/invitations/accept — redeem an invitation link: new account or existing one, then membership
import { NextResponse } from "next/server";
import { acceptInvitation } from "@/db/queries/invitations";
import { publicRoute } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { acceptInviteSchema } from "@/lib/validators/member";

export const POST = publicRoute(async ({ req }) => {
  const input = await readJson(req, acceptInviteSchema);
  const joined = await acceptInvitation(input);
  return NextResponse.json(joined, { status: 200 });
});
