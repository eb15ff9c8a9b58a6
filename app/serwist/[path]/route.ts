import { createSerwistRoute } from "@serwist/turbopack";

// Builds app/sw.ts with esbuild at build time and serves it (and its source map) as /serwist/sw.js.
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "app/sw.ts",
  useNativeEsbuild: true,
});
