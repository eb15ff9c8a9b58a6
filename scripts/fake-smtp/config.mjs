// Configuration of the local SMTP fake, from the environment.
import path from "node:path";
import { fileURLToPath } from "node:url";

const PROJECT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

function port(name, fallback) {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0 || value > 65535) throw new Error(`${name} must be a port number (got "${raw}")`);
  return value;
}

/** The messages API listens 1000 above the SMTP port unless told otherwise (2525 → 3525). */
export function loadConfig() {
  const smtpPort = port("SMTP_PORT", 2525);
  return {
    smtpPort,
    apiPort: port("SMTP_API_PORT", smtpPort + 1000),
    dir: path.resolve(PROJECT_ROOT, process.env.FAKE_SMTP_DIR || ".data/mail"),
  };
}
