import { BODY_LIMIT_BYTES } from "./lib/http/limits.mjs";
import { apiContentSecurityPolicy, commonSecurityHeaders, reportContentSecurityPolicy } from "./lib/http/security-headers.mjs";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex ships optional drivers (sqlite, mssql…) the bundler cannot resolve; keep it external.
  serverExternalPackages: ["knex", "pg", "nodemailer", "rate-limiter-flexible", "esbuild", "sharp", "pdfkit", "svg-to-pdfkit"],
  poweredByHeader: false,
  experimental: {
    // One body limit for server actions and route handlers (lib/http/limits.mjs); proxy.ts
    // answers 413 with a message above it, before Next would.
    serverActions: { bodySizeLimit: BODY_LIMIT_BYTES },
    // proxy.ts reads action bodies to check them. Next buffers at most this much for it, dropping
    // the chunk that crosses; twice the limit still shows any body over the limit as over it.
    proxyClientMaxBodySize: 2 * BODY_LIMIT_BYTES,
  },
  async headers() {
    return [
      { source: "/:path*", headers: commonSecurityHeaders },
      // pages get theirs, with a nonce, from proxy.ts
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: apiContentSecurityPolicy }] },
      // the handover report's print view styles itself (the later rule wins for the same header)
      { source: "/api/v1/revisions/:revisionId/report", headers: [{ key: "Content-Security-Policy", value: reportContentSecurityPolicy }] },
    ];
  },
};

export default nextConfig;
