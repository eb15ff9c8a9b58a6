import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { listFakeMailbox, type FakeMailboxMessage } from "@/lib/email/fake-mailbox";

export const metadata: Metadata = { title: "Dev outbox", robots: { index: false } };

/**
 * What the app "sent" to the local SMTP fake, newest first. Development only: every other build
 * answers 404, so no production server ever shows it.
 */
export default async function DevOutboxPage() {
  if (process.env.NODE_ENV !== "development") notFound();
  let messages: FakeMailboxMessage[] = [];
  let problem: string | null = null;
  try {
    messages = await listFakeMailbox();
  } catch (error) {
    problem = `${(error as Error).message} Start it with: npm run mail:start`;
  }
  return (
    <main className="mx-auto flex w-full max-w-4xl flex-col gap-4 px-4 py-8">
      <h1 className="text-2xl font-semibold">Dev outbox</h1>
      <p className="text-sm text-steel-600">Messages received by the local SMTP fake (newest 50). Links in them work against this server.</p>
      {problem ? <p role="alert" className="text-sm text-fail">{problem}</p> : null}
      {messages.length === 0 && !problem ? <p className="text-sm">No messages yet.</p> : null}
      {messages.map((m) => (
        <details key={m.id} className="rounded-lg bg-white p-4 ring-1 ring-steel-200">
          <summary className="cursor-pointer">
            <span className="font-medium">{m.subject}</span> <span className="text-sm text-steel-600">→ {m.envelope.to.join(", ")} · {m.receivedAt}</span>
          </summary>
          <pre className="mt-3 whitespace-pre-wrap text-sm">{m.text}</pre>
          <iframe title={`HTML of ${m.subject}`} sandbox="" srcDoc={m.html} className="mt-3 h-96 w-full rounded border border-steel-200 bg-white" />
        </details>
      ))}
    </main>
  );
}
