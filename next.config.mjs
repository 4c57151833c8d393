import { BODY_LIMIT_BYTES } from "./lib/http/limits.mjs";
import { apiContentSecurityPolicy, commonSecurityHeaders } from "./lib/http/security-headers.mjs";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex ships optional drivers (sqlite, mssql…) the bundler cannot resolve; keep it external.
  serverExternalPackages: ["knex", "pg", "nodemailer", "rate-limiter-flexible"],
  poweredByHeader: false,
  experimental: {
    // One body limit for server actions and route handlers (lib/http/limits.mjs); proxy.ts
    // answers 413 with a message above it, before Next would.
    serverActions: { bodySizeLimit: BODY_LIMIT_BYTES },
    // proxy.ts reads action bodies to check them; buffer no more than the limit (+1 to see "over")
    proxyClientMaxBodySize: BODY_LIMIT_BYTES + 1,
  },
  async headers() {
    return [
      { source: "/:path*", headers: commonSecurityHeaders },
      // pages get theirs, with a nonce, from proxy.ts
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: apiContentSecurityPolicy }] },
    ];
  },
};

export default nextConfig;
