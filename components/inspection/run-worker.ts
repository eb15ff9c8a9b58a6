"use client";

/** The cache the service worker reads run pages from when there is no connection (see app/sw.ts). */
export const RUN_PAGE_CACHE = "presswright-inspection-runs";

/**
 * Registers the service worker for the inspection pages only, and stores this run page so a
 * reload without signal still opens it (the worker keeps later loads fresh itself).
 */
export function keepRunPageOffline(): void {
  if (!("serviceWorker" in navigator) || !navigator.onLine) return;
  void navigator.serviceWorker
    .register("/serwist/sw.js", { scope: "/inspections/" })
    .then(() => caches.open(RUN_PAGE_CACHE))
    .then((cache) => cache.add(window.location.pathname))
    .catch(() => {
      // Without a worker the run still works online; only an offline reload is lost.
    });
}
