import { z } from "zod";

// In the browser the Content-Security-Policy (proxy.ts) forbids eval, so zod cannot use its
// compiled parsers there and falls back to the plain ones; `jitless` says so up front and
// skips zod's probe for eval, which the browser would otherwise report as a CSP violation.
// The server keeps the compiled parsers. Imported by components/browser-setup.tsx (root layout).
if (typeof window !== "undefined") z.config({ jitless: true });
