/// <reference lib="webworker" />
/**
 * The service worker (built to public/sw.js by scripts/build-sw.mjs). It keeps the pages listed in
 * lib/offline/offline-pages.ts after a first visit (network first, the saved copy when there is no
 * signal) and the app's built files (cache first: their names change with their content). Nothing
 * else is touched: API answers and other pages always go to the network.
 */
import { CacheFirst, CacheableResponsePlugin, ExpirationPlugin, NetworkFirst, Serwist, type SerwistPlugin } from "serwist";
import { ASSET_CACHE, PAGE_CACHE, SAVED_ASSETS_LIMIT, SAVED_PAGES_LIMIT, SW_MESSAGES, isOfflinePage, isShellAsset } from "../lib/offline/offline-pages";

declare const self: ServiceWorkerGlobalScope;

/** Which open page was given a saved copy, and when that copy was made (the server's Date header). */
const savedCopies = new Map<string, number>();

const noteSavedCopy: SerwistPlugin = {
  cachedResponseWillBeUsed: ({ event, cachedResponse }) => {
    const clientId = (event as FetchEvent | undefined)?.resultingClientId;
    const saved = Date.parse(cachedResponse?.headers.get("date") ?? "");
    if (cachedResponse && clientId && Number.isFinite(saved)) savedCopies.set(clientId, saved);
    return cachedResponse;
  },
};

// A redirect (to sign-in) or an error page is never kept in place of the real page.
const onlyWholePages: SerwistPlugin = {
  cacheWillUpdate: async ({ response }) => (response.status === 200 && !response.redirected ? response : null),
};

const pages = new NetworkFirst({
  cacheName: PAGE_CACHE,
  // A basement signal that connects but never answers counts as none.
  networkTimeoutSeconds: 6,
  plugins: [onlyWholePages, noteSavedCopy, new ExpirationPlugin({ maxEntries: SAVED_PAGES_LIMIT })],
});

const serwist = new Serwist({
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  disableDevLogs: true,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.mode === "navigate" && isOfflinePage(url.pathname),
      handler: pages,
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && isShellAsset(url.pathname),
      handler: new CacheFirst({
        cacheName: ASSET_CACHE,
        plugins: [new CacheableResponsePlugin({ statuses: [200] }), new ExpirationPlugin({ maxEntries: SAVED_ASSETS_LIMIT })],
      }),
    },
  ],
});

/**
 * The first visit happens before this worker controls the page, so the page sends its own address
 * and the built files it loaded; they are saved here so the next visit works without a signal.
 */
async function warm(urls: string[]) {
  const [pageCache, assetCache] = await Promise.all([caches.open(PAGE_CACHE), caches.open(ASSET_CACHE)]);
  await Promise.all(
    urls.map(async (raw) => {
      let url: URL;
      try {
        url = new URL(raw, self.location.origin);
      } catch {
        return;
      }
      if (url.origin !== self.location.origin) return;
      try {
        if (isShellAsset(url.pathname)) {
          if (!(await assetCache.match(url.href))) await assetCache.add(url.href);
        } else if (isOfflinePage(url.pathname)) {
          const res = await fetch(url.href, { credentials: "same-origin" });
          if (res.status === 200 && !res.redirected) await pageCache.put(url.href, res);
        }
      } catch {
        // No signal right now: the next visit saves it instead.
      }
    }),
  );
}

self.addEventListener("message", (event) => {
  const data = event.data as { type?: string; urls?: unknown } | null;
  const port = event.ports[0];
  if (data?.type === SW_MESSAGES.warm && Array.isArray(data.urls)) {
    event.waitUntil(warm(data.urls.filter((u): u is string => typeof u === "string").slice(0, 500)).then(() => port?.postMessage({ done: true })));
  } else if (data?.type === SW_MESSAGES.forget) {
    savedCopies.clear();
    event.waitUntil(caches.delete(PAGE_CACHE).then(() => port?.postMessage({ done: true })));
  } else if (data?.type === SW_MESSAGES.savedAt) {
    const id = (event.source as Client | null)?.id ?? "";
    port?.postMessage({ savedAt: savedCopies.get(id) ?? null });
    savedCopies.delete(id);
  }
});

serwist.addEventListeners();
