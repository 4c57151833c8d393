"use client";
/**
 * Makes the site sheet an installable web app that opens with no network once visited:
 * registers the service worker (Serwist, app/serwist/[path]/route.ts → lib/offline/service-worker.ts)
 * and, once it runs, asks it to keep this page and every script, style and font the page
 * loaded (they were fetched before the worker took control, so it has not seen them).
 */
import { SerwistProvider } from "@serwist/turbopack/react";
import { useEffect, type ReactNode } from "react";

/** The worker that controls this page, once it does (after a first install it takes over: clientsClaim). */
async function controller(): Promise<ServiceWorker | null> {
  await navigator.serviceWorker.ready;
  if (navigator.serviceWorker.controller) return navigator.serviceWorker.controller;
  return new Promise((resolve) => {
    navigator.serviceWorker.addEventListener("controllerchange", () => resolve(navigator.serviceWorker.controller), { once: true });
    setTimeout(() => resolve(navigator.serviceWorker.controller), 30_000);
  });
}

async function keepThisPage() {
  if (!("serviceWorker" in navigator) || !navigator.onLine) return;
  const sw = await controller();
  if (!sw) return;
  const assets = performance.getEntriesByType("resource").map((e) => e.name)
    .filter((u) => u.startsWith(location.origin) && /\/_next\/static\/|\/api\/v1\/uploads\/[^/]+\/thumbnail$/.test(u));
  const kept = await new Promise<boolean>((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => resolve(true);
    sw.postMessage({ type: "CACHE_URLS", payload: { urlsToCache: [location.href, ...assets] } }, [channel.port2]);
    setTimeout(() => resolve(false), 30_000);
  });
  // the page says so (tests wait for it; a person sees the pages work without a network)
  if (kept) document.documentElement.dataset.offlineReady = "true";
}

export function OfflineShell({ children }: { children: ReactNode }) {
  useEffect(() => {
    const keep = () => void keepThisPage();
    keep();
    window.addEventListener("online", keep);
    return () => window.removeEventListener("online", keep);
  }, []);
  return (
    <SerwistProvider swUrl="/serwist/sw.js" reloadOnOnline={false} cacheOnNavigation={false}>
      {children}
    </SerwistProvider>
  );
}
