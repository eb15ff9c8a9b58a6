// Waits until the app answers /api/health (or the timeout passes); used by the start and test scripts.
const [url, timeoutS = "90"] = process.argv.slice(2);
const deadline = Date.now() + Number(timeoutS) * 1000;
while (Date.now() < deadline) {
  try {
    const res = await fetch(url);
    if (res.ok) process.exit(0);
  } catch {
    // not listening yet
  }
  await new Promise((r) => setTimeout(r, 500));
}
console.error(`No healthy answer from ${url} within ${timeoutS} s.`);
process.exit(1);
