// POST /api/invitations/accept — redeem an invitation link: new account or existing one, then membership
import { NextResponse } from "next/server";
import { publicRoute } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { redeemInvitation } from "@/lib/server/members/accept-invitation";
import { acceptInviteSchema } from "@/lib/validators/member";

export const POST = publicRoute(async ({ req }) =>
  NextResponse.json(await redeemInvitation(await readJson(req, acceptInviteSchema), req.headers), { status: 200 }),
);
