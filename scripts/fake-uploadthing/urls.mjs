// The file URLs the fake hands out, in the SDK's path form (UPLOADTHING_UFS_APP_ID_LOCATION=path):
// http://localhost:{port}/a/{appId}/{key}. "localhost" in the host makes the SDK sign http URLs.
export function ufsBase(ctx) {
  return `http://localhost:${ctx.port}`;
}

export function fileUrls(ctx, key) {
  const ufsUrl = `${ufsBase(ctx)}/a/${ctx.config.appId}/${key}`;
  return { url: `${ufsBase(ctx)}/f/${key}`, appUrl: ufsUrl, ufsUrl };
}
