// One place for environment-derived settings, each with a safe local default
// (see .env.example). Server-side only values; nothing secret has a default in production.

const appUrl = process.env.APP_URL ?? "http://localhost:3000";

/** Whether a URL's host is this machine only (localhost, 127.0.0.0/8, ::1). */
export function isLoopbackUrl(url: string): boolean {
  try {
    const host = new URL(url).hostname.replace(/^\[|\]$/g, "").toLowerCase();
    return host === "localhost" || host.endsWith(".localhost") || /^127(\.\d{1,3}){3}$/.test(host) || host === "::1";
  } catch {
    return false;
  }
}

/**
 * A development convenience that would be an account-takeover hole on a reachable server
 * (one-click demo sign-in, the caught-mail page): on only when asked for explicitly AND the
 * app is served on loopback. scripts/start.sh and scripts/test.sh ask for both; `npm start`
 * refuses to start when they are asked for with a non-loopback APP_URL.
 */
function loopbackOnly(name: string): boolean {
  if (process.env[name] !== "true") return false;
  if (isLoopbackUrl(appUrl)) return true;
  console.warn(`[loopwright] ${name}=true ignored: APP_URL (${appUrl}) is not on loopback (localhost / 127.0.0.1).`);
  return false;
}

export const config = {
  databaseUrl: process.env.DATABASE_URL ?? "postgres://app@127.0.0.1:54329/loopwright",
  appUrl,
  smtpHost: process.env.SMTP_HOST ?? "127.0.0.1",
  smtpPort: Number(process.env.SMTP_PORT ?? 1025),
  mailWebUrl: process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1080",
  mailFrom: process.env.MAIL_FROM ?? "Loopwright <no-reply@loopwright.example>",
  s3Endpoint: process.env.S3_ENDPOINT ?? "http://127.0.0.1:4569",
  s3Bucket: process.env.S3_BUCKET ?? "loopwright-uploads",
  s3Region: process.env.S3_REGION ?? "us-east-1",
  s3AccessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER",
  s3SecretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER",
  /** One-click sign-in as the seeded demo people (loopback only, off unless DEMO_SIGN_IN=true). */
  demoSignIn: loopbackOnly("DEMO_SIGN_IN"),
  /** /dev/mail, the caught-mail page (loopback only, off unless MAIL_VIEWER=true). */
  mailViewer: loopbackOnly("MAIL_VIEWER"),
  /**
   * Proxies whose X-Forwarded-For is believed (IPs or CIDRs, comma-separated). Empty: none,
   * and the client address is the connection's own (lib/http/client-address.ts).
   */
  trustedProxies: process.env.TRUSTED_PROXIES ?? "",
  secureCookies: (process.env.SECURE_COOKIES ?? "false") === "true",
};
