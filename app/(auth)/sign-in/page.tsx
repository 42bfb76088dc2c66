import type { Metadata } from "next";
import { safeReturnPath } from "@/lib/auth/return-to";
import { SignInForm } from "./sign-in-client";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; joined?: string }> }) {
  const { callbackUrl, joined } = await searchParams;
  // Only paths on this site: an open redirect through the sign-in page would be a phishing aid.
  const next = safeReturnPath(callbackUrl);
  return <SignInForm next={next} joined={joined === "1"} />;
}
