"use client";

// Rendered once by the root layout, so its imports run in the browser before any page code.
import "@/lib/zod-browser";

export function BrowserSetup() {
  return null;
}
