import Link from "next/link";
import type { ReactNode } from "react";
import { Logo } from "@/components/logo";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-6 py-10">
      <Link href="/" className="mb-6 flex items-center gap-2 text-lg font-bold text-spruce-800">
        <Logo /> Miterwise
      </Link>
      <div className="rounded-lg border border-maple-200 bg-white p-6 shadow-sm">{children}</div>
    </main>
  );
}
