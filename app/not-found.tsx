import type { Metadata } from "next";
import { NotFoundState } from "@/components/shell/page-state";

export const metadata: Metadata = { title: "Not found" };

export default function NotFound() {
  return (
    <main className="px-4 py-16">
      <NotFoundState />
    </main>
  );
}
