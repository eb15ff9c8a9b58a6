# shellcheck shell=bash
# Sourced by serve.sh and test.sh: points the uploadthing SDK at the project's local fake unless
# the environment already names a real service (production sets only UPLOADTHING_TOKEN).
export UPLOADTHING_TOKEN="${UPLOADTHING_TOKEN:-eyJhcGlLZXkiOiJza19sb2NhbCIsImFwcElkIjoibG9jYWxhcHAiLCJyZWdpb25zIjpbImxvY2FsIl19}"
if [[ "$UPLOADTHING_TOKEN" == "eyJhcGlLZXkiOiJza19sb2NhbCIsImFwcElkIjoibG9jYWxhcHAiLCJyZWdpb25zIjpbImxvY2FsIl19" ]]; then
  export UPLOADTHING_INGEST_URL="${UPLOADTHING_INGEST_URL:-http://127.0.0.1:${FAKE_UT_PORT:-4010}}"
  export UPLOADTHING_API_URL="${UPLOADTHING_API_URL:-http://127.0.0.1:${FAKE_UT_PORT:-4010}}"
  export UPLOADTHING_UFS_HOST="${UPLOADTHING_UFS_HOST:-localhost:${FAKE_UT_PORT:-4010}}"
  export UPLOADTHING_UFS_APP_ID_LOCATION="${UPLOADTHING_UFS_APP_ID_LOCATION:-path}"
  export UPLOADTHING_LOCAL_FAKE=1
fi
# The inspection chain's HMAC key for local runs and tests only; production sets its own secret.
export INSPECTION_CHAIN_KEY="${INSPECTION_CHAIN_KEY:-presswright-local-development-chain-key-not-secret}"
