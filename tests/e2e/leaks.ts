/** What must never reach a client in an answer: error classes, stack frames, driver codes, SQL, server paths. */
const LEAKS: readonly RegExp[] = [
  /\b[A-Z]\w*Error: /,
  /\bat (?:async )?[\w$.<>]+ \(/,
  /\bat [^\s"'<>]+:\d+:\d+/,
  /\bER_[A-Z_]{3,}/,
  /\b(?:ECONNREFUSED|ECONNRESET|ETIMEDOUT|EPIPE|PROTOCOL_CONNECTION_LOST)\b/,
  /\bSQL(?:STATE)?\b/,
  /\b(?:SELECT|INSERT INTO|UPDATE|DELETE FROM)\b[^<]{0,200}\b(?:FROM|VALUES|SET|WHERE)\b/,
  /node_modules|\/work\/|mysql2|drizzle/i,
];

/** The first leaking fragment in `body`, or null when it is clean. */
export function leakedDetail(body: string): string | null {
  for (const pattern of LEAKS) {
    const match = pattern.exec(body);
    if (match) return match[0];
  }
  return null;
}
