import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { BrowserSetup } from "@/components/browser-setup";
import { plexMono, plexSans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Loopwright", template: "%s · Loopwright" },
  description: "Draw, check and size wet heating plant rooms — from schematic to handover.",
  icons: { icon: "/favicon.svg" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#b4632b" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request, so Next.js can put this response's CSP nonce
  // (proxy.ts) on its scripts; a page prerendered at build time would carry none and not run.
  await connection();
  return (
    <html lang="en-GB" className={`${plexSans.variable} ${plexMono.variable}`}>
      <body className="min-h-screen"><BrowserSetup />{children}</body>
    </html>
  );
}
