// Security headers for every page and route. Plain JS: next.config.mjs (headers() for every
// path, and the API's own CSP) and proxy.ts (each page's CSP with its nonce) both read it.

/** Sent with every response, pages, routes and static files alike. */
export const commonSecurityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "same-origin" },
  // the CSP's frame-ancestors 'none' says the same to current browsers; this is for older ones
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

/** Route handlers answer JSON (or files): nothing in them may load or run anything. */
export const apiContentSecurityPolicy = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * The handover report's HTML print view (a route handler's answer, not a page): its own inline
 * stylesheet and inline SVG drawings, nothing else — no scripts, no other origin.
 */
export const reportContentSecurityPolicy = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * A page's policy (Next.js 16 guide "Content Security Policy", nonce set by proxy.ts):
 * scripts only with this response's nonce ('strict-dynamic' lets them load Next's chunks);
 * <style> elements with the nonce too, but style="" attributes allowed (style-src-attr),
 * because React renders the drawing board's positions and sizes (@xyflow/react) and the
 * charts as inline style attributes. In development React and Next also need eval and
 * injected <style> tags. `otherOrigins` are services the browser talks to directly
 * (uploads go to the S3 endpoint by presigned URL).
 * @param {string} nonce
 * @param {{ dev?: boolean, https?: boolean, otherOrigins?: string[] }} [options]
 * @returns {string}
 */
export function pageContentSecurityPolicy(nonce, { dev = false, https = false, otherOrigins = [] } = {}) {
  const others = otherOrigins.join(" ");
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    `style-src 'self' ${dev ? "'unsafe-inline'" : `'nonce-${nonce}'`}`,
    "style-src-attr 'unsafe-inline'",
    `img-src 'self' data: blob: ${others}`.trim(),
    "font-src 'self'",
    `connect-src 'self' ${others}`.trim(),
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}
