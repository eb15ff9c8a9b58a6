// Starts scripts/fake-uploadthing/server.mjs as a child process on a free port with its own
// storage folder, as the test command would, and stops it again.
import { spawn } from "node:child_process";
import { fileURLToPath } from "node:url";

const SERVER = fileURLToPath(new URL("../../../scripts/fake-uploadthing/server.mjs", import.meta.url));

export type FakeServer = {
  port: number;
  /** What the fake printed so far (stdout and stderr), for failure messages. */
  output: () => string;
  stop: () => Promise<void>;
};

export async function startFake(options: { dir: string; callbackTimeoutMs: number }): Promise<FakeServer> {
  const child = spawn(process.execPath, [SERVER], {
    env: {
      ...process.env,
      FAKE_UT_PORT: "0",
      FAKE_UT_DIR: options.dir,
      FAKE_UT_CALLBACK_TIMEOUT_MS: String(options.callbackTimeoutMs),
      // Empty: the fake falls back to its built-in local token, which must be the one the SDK
      // gets from lib/uploads/env.ts, or every signed request in these tests fails.
      UPLOADTHING_TOKEN: "",
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  const port = await new Promise<number>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`fake did not start within 10 s:\n${output}`)), 10_000);
    const onData = (chunk: Buffer): void => {
      output += chunk.toString();
      const match = /ready on http:\/\/127\.0\.0\.1:(\d+)/.exec(output);
      if (match) {
        clearTimeout(timer);
        resolve(Number(match[1]));
      }
    };
    child.stdout.on("data", onData);
    child.stderr.on("data", onData);
    child.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`fake exited with code ${code}:\n${output}`));
    });
  });
  return {
    port,
    output: () => output,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", () => resolve());
        child.kill("SIGTERM");
      }),
  };
}
