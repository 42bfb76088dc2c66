import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { outboxAvailable, outboxDir } from "@/lib/env";
import { readOutbox } from "@/lib/mail/outbox";
import { Logo } from "@/components/logo";

export const metadata: Metadata = { title: "Demo outbox" };
export const dynamic = "force-dynamic";

/**
 * Shows what would have been e-mailed, so someone trying the demo can follow an invitation link. It lists
 * every organisation's links, so it exists only while mail goes to the local SMTP stand-in and the app listens
 * on loopback only; anywhere else it is a 404.
 */
export default async function OutboxPage() {
  if (!outboxAvailable()) notFound();
  const messages = await readOutbox(outboxDir());
  return (
    <main className="mx-auto max-w-3xl px-6 py-10">
      <div className="mb-2 flex items-center gap-2 text-lg font-bold text-spruce-800">
        <Logo /> Miterwise
      </div>
      <h1 className="text-xl font-bold">Demo outbox</h1>
      <p className="mt-1 text-sm text-graphite-700">
        Mail sent by this demo is kept here instead of being delivered. Newest first.
      </p>
      {messages.length === 0 && <p className="mt-6 text-sm text-graphite-600">Nothing has been sent yet.</p>}
      <ol className="mt-6 space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-lg border border-maple-200 bg-white p-4" data-testid="outbox-message">
            <p className="text-xs text-graphite-600">
              {new Date(m.date).toLocaleString("en-US")} · to {m.to.join(", ")}
            </p>
            <h2 className="mt-1 font-semibold">{m.subject}</h2>
            <div className="mt-2 whitespace-pre-wrap text-sm">
              {m.text.split(/(https?:\/\/\S+)/g).map((part, i) =>
                /^https?:\/\//.test(part) ? (
                  <a key={i} href={part} className="break-all font-semibold text-spruce-700 underline">
                    {part}
                  </a>
                ) : (
                  part
                ),
              )}
            </div>
          </li>
        ))}
      </ol>
    </main>
  );
}
