// Tearline service worker: the app shell, its scripts, styles and fonts open without signal.
// Pages: network first, the last copy when offline. Built assets (hashed names): cache first.
// API calls are never cached; filing without signal is handled by the page's outbox.
const SHELL = "tearline-shell-v1";
const ASSETS = "tearline-assets-v1";
const OFFLINE_PAGES = ["/", "/cases/new"];

self.addEventListener("install", (event) => {
  event.waitUntil(
    caches.open(SHELL).then((c) => Promise.all(OFFLINE_PAGES.map((u) => c.add(new Request(u, { credentials: "same-origin" })).catch(() => undefined)))),
  );
  self.skipWaiting();
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    caches.keys().then((keys) => Promise.all(keys.filter((k) => k !== SHELL && k !== ASSETS).map((k) => caches.delete(k)))).then(() => self.clients.claim()),
  );
});

async function networkFirst(request) {
  const cache = await caches.open(SHELL);
  try {
    const res = await fetch(request);
    if (res.ok && !res.redirected) cache.put(request, res.clone());
    return res;
  } catch {
    const hit = (await cache.match(request, { ignoreVary: true })) || (request.mode === "navigate" ? await cache.match("/", { ignoreVary: true }) : undefined);
    return hit || new Response("You are offline and this page was not opened on this device before.", { status: 503, headers: { "content-type": "text/plain; charset=utf-8" } });
  }
}

async function cacheFirst(request) {
  const cache = await caches.open(ASSETS);
  const hit = await cache.match(request);
  if (hit) return hit;
  const res = await fetch(request);
  if (res.ok) cache.put(request, res.clone());
  return res;
}

self.addEventListener("fetch", (event) => {
  const { request } = event;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || url.pathname.startsWith("/api/")) return;
  if (url.pathname.startsWith("/_next/static/")) return event.respondWith(cacheFirst(request));
  if (request.mode === "navigate" || request.headers.get("RSC") === "1") return event.respondWith(networkFirst(request));
});
