/**
 * The service worker (built by Serwist's Turbopack route, app/serwist/[path]/route.ts).
 * It keeps what the site sheet needs in a plant room with no signal: the build's scripts,
 * styles and fonts (precached), each site sheet page visited (network first, the kept copy
 * when there is none) and photo thumbnails (kept once seen). Nothing else is cached, and
 * writes (POST, PUT) are never touched: the page's own outbox queues those.
 */
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type PrecacheEntry } from "serwist";

// `self.__SW_MANIFEST` is replaced by the precache list when the worker is built (it must stay written this way).
type WithManifest = { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

const sitePage = /^\/projects\/[^/]+\/schematics\/[^/]+\/site\/?$/;
const thumbnail = /^\/api\/v1\/uploads\/[^/]+\/thumbnail$/;

const serwist = new Serwist({
  precacheEntries: (self as unknown as WithManifest).__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    {
      matcher: ({ url, sameOrigin, request }) => sameOrigin && sitePage.test(url.pathname) && request.headers.get("RSC") !== "1",
      handler: new NetworkFirst({ cacheName: "site-pages", networkTimeoutSeconds: 5, matchOptions: { ignoreVary: true },
        plugins: [new ExpirationPlugin({ maxEntries: 20, maxAgeSeconds: 30 * 24 * 3600 })] }),
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && thumbnail.test(url.pathname),
      handler: new CacheFirst({ cacheName: "site-thumbnails", plugins: [new ExpirationPlugin({ maxEntries: 300, maxAgeSeconds: 90 * 24 * 3600 })] }),
    },
    {
      matcher: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith("/_next/static/"),
      handler: new CacheFirst({ cacheName: "next-static", plugins: [new ExpirationPlugin({ maxEntries: 400 })] }),
    },
  ],
});

serwist.addEventListeners();
