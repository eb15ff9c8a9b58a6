// Shared by the local fakes' probe scripts: asks a health URL whether our fake answers there.
// Resolves 0 if it does, 1 if nothing listens, 2 if something else does; with a timeout in
// seconds, keeps asking while nothing listens.
export async function probeHealth(url, isOurs, timeoutS = 0) {
  const deadline = Date.now() + timeoutS * 1000;
  const once = async () => {
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(2000) });
      const body = await res.json().catch(() => null);
      return isOurs(body) ? 0 : 2;
    } catch (error) {
      return error?.cause?.code === "ECONNREFUSED" ? 1 : 2;
    }
  };
  let result = await once();
  while (result === 1 && Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 200));
    result = await once();
  }
  return result;
}
