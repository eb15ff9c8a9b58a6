/**
 * Absolute link into the app, for e-mails and QR cards. APP_URL (the public origin) wins; without
 * it, the origin of the request that caused it, then the local server.
 */
export function appUrl(path: string, requestOrigin?: string | null): string {
  const origin = process.env.APP_URL || requestOrigin || `http://127.0.0.1:${process.env.PORT || 3000}`;
  return new URL(path, origin).toString();
}
