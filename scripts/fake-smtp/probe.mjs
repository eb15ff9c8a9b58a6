// Exit 0 if the SMTP fake answers on its API port, 1 if nothing listens, 2 if something else does.
// With a timeout in seconds, keeps trying until then. Used by start.sh.
import { probeHealth } from "../lib/probe-health.mjs";
import { loadConfig } from "./config.mjs";

const { apiPort, smtpPort } = loadConfig();
const ours = (body) => body?.service === "fake-smtp" && body.smtpPort === smtpPort;
process.exit(await probeHealth(`http://127.0.0.1:${apiPort}/_fake/health`, ours, Number(process.argv[2] ?? "0")));
