// Exit 0 if the SMTP fake answers on its API port, 1 if nothing listens, 2 if something else does.
// With a timeout in seconds, keeps trying until then. Used by start.sh.
import { loadConfig } from "./config.mjs";

const timeoutS = Number(process.argv[2] ?? "0");
const { apiPort, smtpPort } = loadConfig();
const deadline = Date.now() + timeoutS * 1000;

async function probe() {
  try {
    const res = await fetch(`http://127.0.0.1:${apiPort}/_fake/health`, { signal: AbortSignal.timeout(2000) });
    const body = await res.json().catch(() => null);
    return body?.service === "fake-smtp" && body.smtpPort === smtpPort ? 0 : 2;
  } catch (error) {
    return error?.cause?.code === "ECONNREFUSED" ? 1 : 2;
  }
}

let result = await probe();
while (result === 1 && Date.now() < deadline) {
  await new Promise((resolve) => setTimeout(resolve, 200));
  result = await probe();
}
process.exit(result);
