// Exit 0 if the upload fake answers on 127.0.0.1:<port>, 1 if nothing listens, 2 if something
// else does. With a timeout in seconds, keeps trying until then. Used by start.sh.
import { probeHealth } from "../lib/probe-health.mjs";

const [port = "4010", timeoutS = "0"] = process.argv.slice(2);
process.exit(await probeHealth(`http://127.0.0.1:${port}/_fake/health`, (body) => body?.service === "fake-uploadthing", Number(timeoutS)));
