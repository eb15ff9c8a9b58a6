/** Absolute link into the app for e-mails and QR cards: APP_URL in production, the local server otherwise. */
export function appUrl(path: string): string {
  const origin = (process.env.APP_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`).replace(/\/+$/, "");
  return `${origin}${path}`;
}
