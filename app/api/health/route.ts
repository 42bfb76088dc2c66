// GET /api/health — liveness for load balancers: answers without touching the database or a session
import { NextResponse } from "next/server";

export const dynamic = "force-dynamic";

export function GET() {
  return NextResponse.json({ ok: true });
}
