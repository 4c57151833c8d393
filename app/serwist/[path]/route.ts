import { createSerwistRoute } from "@serwist/turbopack";

// Serves the service worker (/serwist/sw.js), built from lib/offline/service-worker.ts with
// esbuild when the app is built, with the list of build files to precache.
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "lib/offline/service-worker.ts",
  useNativeEsbuild: true,
  globPatterns: [".next/static/**/*.{js,css,woff2}"],
});
