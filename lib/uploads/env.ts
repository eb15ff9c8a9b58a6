/**
 * The UploadThing SDK's environment for local development and tests, pointing it at the
 * project's fake (scripts/fake-uploadthing). The SDK reads only these variables, so production
 * sets just a real UPLOADTHING_TOKEN and leaves the others unset: no code path differs.
 *
 * Not server-only on purpose: scripts and tests import it outside Next.js. It holds no secret:
 * the token below only ever works against the local fake.
 */

export const LOCAL_UPLOADTHING_PORT = 4010;

/** base64 of {"apiKey":"sk_local","appId":"localapp","regions":["local"]}: the SDK requires an sk_ key and a region. */
export const LOCAL_UPLOADTHING_TOKEN =
  "eyJhcGlLZXkiOiJza19sb2NhbCIsImFwcElkIjoibG9jYWxhcHAiLCJyZWdpb25zIjpbImxvY2FsIl19";

export type UploadthingEnv = {
  UPLOADTHING_TOKEN: string;
  /** Presigned upload URLs and /route-metadata go here. */
  UPLOADTHING_INGEST_URL: string;
  /** UTApi calls go here. */
  UPLOADTHING_API_URL: string;
  /** File URLs. "localhost" in it makes the SDK sign http (not https) URLs. */
  UPLOADTHING_UFS_HOST: string;
  /** Path form (/a/{appId}/{key}): the subdomain form needs a DNS name Node cannot resolve locally. */
  UPLOADTHING_UFS_APP_ID_LOCATION: "path";
};

/** The variables for an app talking to the fake on `port` (4010 for the start command). */
export function localUploadthingEnv(port: number = LOCAL_UPLOADTHING_PORT): UploadthingEnv {
  return {
    UPLOADTHING_TOKEN: LOCAL_UPLOADTHING_TOKEN,
    UPLOADTHING_INGEST_URL: `http://127.0.0.1:${port}`,
    UPLOADTHING_API_URL: `http://127.0.0.1:${port}`,
    UPLOADTHING_UFS_HOST: `localhost:${port}`,
    UPLOADTHING_UFS_APP_ID_LOCATION: "path",
  };
}
