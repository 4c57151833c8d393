import type { MetadataRoute } from "next";

// The installable web app: installers add the site sheet to their home screen; it opens
// without a network once visited (the service worker keeps it, components/site-sheet/offline).
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Loopwright",
    short_name: "Loopwright",
    description: "Site sheets, tests and commissioning for wet heating installs — on the phone, with or without signal.",
    start_url: "/projects",
    scope: "/",
    display: "standalone",
    background_color: "#faf7f2",
    theme_color: "#b4632b",
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
    ],
  };
}
