/** Reads what the local SMTP fake received, through its own JSON API (scripts/fake-smtp). */
const apiPort = Number(process.env.SMTP_API_PORT || Number(process.env.SMTP_PORT || 2525) + 1000);

export type FakeAttachment = { filename: string | null; contentType: string; size: number; content: string | null };
export type FakeMessage = { id: string; receivedAt: string; subject: string; text: string; html: string; envelope: { to: string[] }; attachments?: FakeAttachment[] };

export async function messagesTo(address: string): Promise<FakeMessage[]> {
  const res = await fetch(`http://127.0.0.1:${apiPort}/messages?to=${encodeURIComponent(address)}`);
  if (!res.ok) throw new Error(`SMTP fake answered ${res.status}; is it running (scripts/fake-smtp/start.sh)?`);
  return ((await res.json()) as { messages: FakeMessage[] }).messages;
}

/** The token at the end of the first link to `path` in a message's plain text. */
export function tokenFrom(message: FakeMessage, path: string): string {
  const m = new RegExp(`https?://[^\\s]+${path}/([a-z2-7]{24}\\.[a-z2-7]{52})`).exec(message.text);
  if (!m) throw new Error(`No ${path} link in: ${message.text}`);
  return m[1]!;
}

/** Waits (polling the fake) for a message to `address` that `match` accepts: the outbox sender delivers in the background. */
export async function waitForMessage(address: string, match: (m: FakeMessage) => boolean, timeoutMs = 30_000): Promise<FakeMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await messagesTo(address)).find(match);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No matching message to ${address} within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
}
