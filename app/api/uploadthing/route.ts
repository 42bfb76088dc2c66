// GET|POST /api/uploadthing — the upload SDK's handshake: presign plan-set PDFs, receive the service's callback
import type { NextRequest } from "next/server";
import { createRouteHandler } from "uploadthing/next";
import { recordPresignedKeys, refuseUnexpectedCallback } from "@/lib/uploads/callback-guard";
import { planRouter } from "./core";

const sdk = createRouteHandler({ router: planRouter });

export const GET = sdk.GET;

export async function POST(req: NextRequest): Promise<Response> {
  if (req.headers.get("uploadthing-hook") === "callback") {
    const { refusal, request } = await refuseUnexpectedCallback(req);
    return refusal ?? sdk.POST(request);
  }
  const res = await sdk.POST(req);
  return new URL(req.url).searchParams.get("actionType") === "upload" ? recordPresignedKeys(res) : res;
}
