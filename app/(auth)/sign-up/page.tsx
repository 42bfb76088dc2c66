import type { Metadata } from "next";
import { SignUpForm } from "./sign-up-client";

export const metadata: Metadata = { title: "Create your account" };

export default function SignUpPage() {
  return <SignUpForm />;
}
