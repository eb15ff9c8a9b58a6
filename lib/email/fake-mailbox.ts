import "server-only";

/** A message as the local SMTP fake keeps it (scripts/fake-smtp). */
export type FakeMailboxMessage = { id: string; receivedAt: string; envelope: { from: string | null; to: string[] }; subject: string; text: string; html: string };

/** The fake's messages API: SMTP_API_PORT, or 1000 above SMTP_PORT (2525 → 3525). */
export function fakeMailboxUrl(env: NodeJS.ProcessEnv = process.env): string {
  const port = Number(env.SMTP_API_PORT || Number(env.SMTP_PORT || 2525) + 1000);
  return `http://127.0.0.1:${port}`;
}

/** The newest messages the fake received (at most 50). Development only; throws when it is not running. */
export async function listFakeMailbox(limit = 50): Promise<FakeMailboxMessage[]> {
  const res = await fetch(`${fakeMailboxUrl()}/messages?limit=${limit}`, { cache: "no-store", signal: AbortSignal.timeout(3000) });
  if (!res.ok) throw new Error(`The SMTP fake answered ${res.status}.`);
  return ((await res.json()) as { messages: FakeMailboxMessage[] }).messages;
}
