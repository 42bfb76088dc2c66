"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: "/sign-in" })}
      className="rounded-md border border-maple-200/40 px-2.5 py-1 text-sm hover:bg-spruce-700"
    >
      Sign out
    </button>
  );
}
