/// <reference lib="webworker" />
// Tearline's service worker, built with Serwist into public/sw.js when Next builds (see lib/offline/build-worker.ts).
// Pages: network first, the last good copy when offline or the signal stalls. Built assets (hashed names): cache
// first. API calls are never cached; filing without signal is the page's outbox (components/offline/).
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type SerwistPlugin } from "serwist";

declare const self: ServiceWorkerGlobalScope;

const PAGES = "tearline-pages-v2";
const ASSETS = "tearline-assets-v2";
/** Opened once while online, these open again without signal: the home screen and the removal form. */
const OFFLINE_PAGES = ["/", "/cases/new"];
/** A shop's poor Wi-Fi: after this long the last good copy of a page is shown instead of waiting on. */
const PAGE_WAIT_SECONDS = 8;

const OFFLINE_TEXT = "You are offline and this page was not opened on this device before.";

// Keep only real pages: a redirect (to sign-in) or an error page must never stand in for the form.
const onlyGoodPages: SerwistPlugin = {
  cacheWillUpdate: async ({ response }) => (response.ok && !response.redirected ? response : null),
};

// Neither network nor cache: a navigation falls back to the home screen, anything else gets a plain 503.
const offlineAnswer: SerwistPlugin = {
  handlerDidError: async ({ request }) =>
    (request.mode === "navigate" ? await caches.match("/", { cacheName: PAGES, ignoreVary: true }) : undefined) ??
    new Response(OFFLINE_TEXT, { status: 503, headers: { "content-type": "text/plain; charset=utf-8" } }),
};

const serwist = new Serwist({
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith("/_next/static/"),
      handler: new CacheFirst({ cacheName: ASSETS, plugins: [new ExpirationPlugin({ maxEntries: 400, maxAgeSeconds: 60 * 24 * 3600 })] }),
    },
    {
      matcher: ({ request, url, sameOrigin }) =>
        sameOrigin &&
        request.method === "GET" &&
        !url.pathname.startsWith("/api/") &&
        (request.mode === "navigate" || request.headers.get("RSC") === "1"),
      handler: new NetworkFirst({
        cacheName: PAGES,
        networkTimeoutSeconds: PAGE_WAIT_SECONDS,
        matchOptions: { ignoreVary: true },
        plugins: [onlyGoodPages, offlineAnswer],
      }),
    },
  ],
});

// Keep the pages a mechanic needs without signal from the moment the worker installs (a page that redirects,
// for someone not signed in, is simply skipped and cached on the next good visit).
self.addEventListener("install", (event) => {
  event.waitUntil(
    caches.open(PAGES).then((cache) =>
      Promise.all(
        OFFLINE_PAGES.map(async (path) => {
          const res = await fetch(new Request(path, { credentials: "same-origin" })).catch(() => null);
          if (res && (await onlyGoodPages.cacheWillUpdate!({ response: res, request: new Request(path), event, state: undefined })))
            await cache.put(path, res);
        }),
      ),
    ),
  );
});

// Caches of earlier Tearline workers go; Serwist's own are left to Serwist.
self.addEventListener("activate", (event) => {
  const keep = new Set([PAGES, ASSETS]);
  event.waitUntil(
    caches.keys().then((keys) => Promise.all(keys.filter((k) => k.startsWith("tearline-") && !keep.has(k)).map((k) => caches.delete(k)))),
  );
});

serwist.addEventListeners();
