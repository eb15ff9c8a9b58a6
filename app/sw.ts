/*
 * The service worker of the inspection run (issue 10), bundled by @serwist/turbopack from
 * app/serwist/[path]/route.ts and registered by the run page with scope /inspections/ only.
 * It keeps the run page and the app's static assets so a run reloads without signal. It never
 * caches API answers or any other signed-in page: requests it has no rule for go to the network
 * untouched.
 */
import { CacheFirst, NetworkFirst, Serwist, type PrecacheEntry } from "serwist";

declare const self: { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

const RUN_PAGE = /^\/inspections\/[a-z2-7]{24}\/run$/;
// Keep in step with components/inspection/run-worker.ts.
const RUN_PAGE_CACHE = "presswright-inspection-runs";

/** Only a plain 200 of the page itself: never a redirect to sign-in or to a signed record. */
const onlyTheRunPage = {
  cacheWillUpdate: async ({ response }: { response: Response }) => (response.status === 200 && !response.redirected ? response : null),
};

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.mode === "navigate" && RUN_PAGE.test(url.pathname),
      handler: new NetworkFirst({ cacheName: RUN_PAGE_CACHE, networkTimeoutSeconds: 4, plugins: [onlyTheRunPage] }),
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && (url.pathname.startsWith("/_next/static/") || url.pathname.startsWith("/fonts/")),
      handler: new CacheFirst({ cacheName: "presswright-static" }),
    },
  ],
});

serwist.addEventListeners();
