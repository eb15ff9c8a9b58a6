/**
 * Where the browser uploads photos to and where they are served from, derived from the SDK's own
 * variables (see env.ts) so the CSP and next/image follow whichever service the app talks to.
 * Without them, the hosted service's hosts apply. Plain TypeScript: next.config.ts and proxy.ts use it.
 */
type Env = Record<string, string | undefined>;
type RemotePattern = { protocol: "http" | "https"; hostname: string; port?: string; pathname: string };

/** The hosted service serves files from {appId}.ufs.sh/f/{key} and takes uploads at {region}.ingest.uploadthing.com. */
const HOSTED_FILES: RemotePattern = { protocol: "https", hostname: "*.ufs.sh", pathname: "/f/**" };
const HOSTED_FILES_SOURCE = "https://*.ufs.sh";
const HOSTED_INGEST_SOURCE = "https://*.ingest.uploadthing.com";

const LOOPBACK_HOSTS = new Set(["localhost", "127.0.0.1", "[::1]"]);

/** The file host set by UPLOADTHING_UFS_HOST; like the SDK, http when the host contains "local". */
export function configuredFileOrigin(env: Env): URL | null {
  const host = env.UPLOADTHING_UFS_HOST;
  if (!host) return null;
  return new URL(`${host.includes("local") ? "http" : "https"}://${host}`);
}

/** True for the project's local fake, whose files live on a loopback address. */
export function isLocalUploadService(env: Env): boolean {
  const origin = configuredFileOrigin(env);
  return env.UPLOADTHING_LOCAL_FAKE === "1" || (origin !== null && LOOPBACK_HOSTS.has(origin.hostname));
}

/** next/image may fetch photos from these and nothing else. */
export function photoImagePatterns(env: Env): RemotePattern[] {
  const origin = configuredFileOrigin(env);
  if (!origin) return [HOSTED_FILES];
  const local: RemotePattern = { protocol: origin.protocol === "http:" ? "http" : "https", hostname: origin.hostname, port: origin.port, pathname: "/**" };
  return [local, HOSTED_FILES];
}

/** CSP sources: img-src for served photos, connect-src for the browser's upload requests. */
export function uploadCspSources(env: Env): { img: string[]; connect: string[] } {
  const files = configuredFileOrigin(env)?.origin;
  const ingest = env.UPLOADTHING_INGEST_URL ? new URL(env.UPLOADTHING_INGEST_URL).origin : undefined;
  return {
    img: [files, HOSTED_FILES_SOURCE].filter((s): s is string => Boolean(s)),
    connect: [ingest, HOSTED_INGEST_SOURCE].filter((s): s is string => Boolean(s)),
  };
}
