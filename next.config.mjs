/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex ships optional drivers (sqlite, mssql…) the bundler cannot resolve; keep it external.
  serverExternalPackages: ["knex", "pg", "nodemailer", "rate-limiter-flexible", "esbuild", "sharp"],
  poweredByHeader: false,
};

export default nextConfig;
