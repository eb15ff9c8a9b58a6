/** Next.js calls this once per server instance: start the e-mail outbox sender in the Node runtime. */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startEmailWorker } = await import("@/lib/email/worker");
  startEmailWorker();
}
