"use client";
/**
 * Makes the site sheet an installable web app that opens with no network once visited:
 * registers the service worker (Serwist, app/serwist/[path]/route.ts → lib/offline/service-worker.ts)
 * and, once it runs, asks it to keep this page and every script, style and font the page
 * loaded (they were fetched before the worker took control, so it has not seen them).
 */
import { SerwistProvider } from "@serwist/turbopack/react";
import { useEffect, type ReactNode } from "react";

function keepThisPage() {
  if (!("serviceWorker" in navigator)) return;
  void navigator.serviceWorker.ready.then((reg) => {
    const assets = performance.getEntriesByType("resource").map((e) => e.name)
      .filter((u) => u.startsWith(location.origin) && /\/_next\/static\/|\/api\/v1\/uploads\/[^/]+\/thumbnail$/.test(u));
    reg.active?.postMessage({ type: "CACHE_URLS", payload: { urlsToCache: [location.href, ...assets] } });
  });
}

export function OfflineShell({ children }: { children: ReactNode }) {
  useEffect(() => {
    keepThisPage();
    window.addEventListener("online", keepThisPage);
    return () => window.removeEventListener("online", keepThisPage);
  }, []);
  return (
    <SerwistProvider swUrl="/serwist/sw.js" reloadOnOnline={false} cacheOnNavigation={false}>
      {children}
    </SerwistProvider>
  );
}
