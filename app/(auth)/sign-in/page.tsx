import type { Metadata } from "next";
import { SignInForm } from "./sign-in-client";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; joined?: string }> }) {
  const { callbackUrl, joined } = await searchParams;
  // Only same-site paths: an open redirect through the sign-in page would be a phishing aid.
  const next = callbackUrl?.startsWith("/") && !callbackUrl.startsWith("//") ? callbackUrl : "/orgs";
  return <SignInForm next={next} joined={joined === "1"} />;
}
