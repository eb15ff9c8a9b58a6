// The production server (scripts/server.mjs) started by a benchmark script from an existing build
// (NEXT_DIST_DIR) on its own port, stopped when the script exits.
import { spawn } from "node:child_process";
import { fileURLToPath } from "node:url";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

export function startBenchServer(port) {
  const server = spawn(process.execPath, ["scripts/server.mjs"], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: "production", PORT: String(port), INSECURE_COOKIES: "1" },
    stdio: ["ignore", "ignore", "inherit"],
  });
  const stop = () => server.kill("SIGTERM");
  process.on("exit", stop);

  async function waitForHealth() {
    const deadline = Date.now() + 90_000;
    while (Date.now() < deadline) {
      try {
        if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return;
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 300));
    }
    throw new Error("the server did not become healthy within 90 s");
  }
  return { server, stop, waitForHealth };
}
