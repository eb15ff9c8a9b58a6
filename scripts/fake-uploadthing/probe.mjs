// Exit 0 if the upload fake answers on 127.0.0.1:<port>, 1 if nothing listens, 2 if something
// else does. With a timeout in seconds, keeps trying until then. Used by start.sh.
const [port = "4010", timeoutS = "0"] = process.argv.slice(2);
const deadline = Date.now() + Number(timeoutS) * 1000;

async function probe() {
  try {
    const res = await fetch(`http://127.0.0.1:${port}/_fake/health`, { signal: AbortSignal.timeout(2000) });
    const body = await res.json().catch(() => null);
    return body?.service === "fake-uploadthing" ? 0 : 2;
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
