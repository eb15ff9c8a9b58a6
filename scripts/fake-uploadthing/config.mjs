// Configuration of the local UploadThing fake, read once from the environment.
import path from "node:path";
import { fileURLToPath } from "node:url";

const PROJECT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

/** The token the app and the fake share in development (not a secret: it only works locally). */
export const LOCAL_TOKEN = Buffer.from(
  JSON.stringify({ apiKey: "sk_local", appId: "localapp", regions: ["local"] }),
).toString("base64");

function parseToken(raw) {
  let parsed;
  try {
    parsed = JSON.parse(Buffer.from(raw, "base64").toString("utf8"));
  } catch {
    throw new Error("UPLOADTHING_TOKEN is not base64-encoded JSON");
  }
  const { apiKey, appId, regions } = parsed ?? {};
  // The SDK refuses the same things (uploadthing shared-schemas ParsedToken).
  if (typeof apiKey !== "string" || !apiKey.startsWith("sk_")) throw new Error("UPLOADTHING_TOKEN: apiKey must start with sk_");
  if (typeof appId !== "string" || !/^[A-Za-z0-9_-]+$/.test(appId)) throw new Error("UPLOADTHING_TOKEN: appId missing or not URL-safe");
  if (!Array.isArray(regions) || regions.length === 0) throw new Error("UPLOADTHING_TOKEN: regions must be a non-empty array");
  return { apiKey, appId };
}

function intFromEnv(name, fallback, min) {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min) throw new Error(`${name} must be an integer >= ${min} (got "${raw}")`);
  return value;
}

export function loadConfig() {
  const { apiKey, appId } = parseToken(process.env.UPLOADTHING_TOKEN || LOCAL_TOKEN);
  return {
    apiKey,
    appId,
    // 0 lets the OS pick a free port (the tests do this); the chosen port is printed on start.
    port: intFromEnv("FAKE_UT_PORT", 4010, 0),
    dir: path.resolve(process.env.FAKE_UT_DIR || path.join(PROJECT_ROOT, ".data", "uploads")),
    callbackTimeoutMs: intFromEnv("FAKE_UT_CALLBACK_TIMEOUT_MS", 15_000, 1),
    // How long a PUT that names a slug waits for the app's /route-metadata (spec §2, dev mode).
    registrationWaitMs: 5_000,
    // A registration nobody uploads to is dropped after this, ending its dev stream.
    registrationTtlMs: 60 * 60 * 1000,
  };
}
