// One place for environment-derived settings, each with a safe local default
// (see .env.example). Server-side only values; nothing secret has a default in production.
export const config = {
  databaseUrl: process.env.DATABASE_URL ?? "postgres://app@127.0.0.1:54329/loopwright",
  appUrl: process.env.APP_URL ?? "http://localhost:3000",
  smtpHost: process.env.SMTP_HOST ?? "127.0.0.1",
  smtpPort: Number(process.env.SMTP_PORT ?? 1025),
  mailWebUrl: process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1080",
  mailFrom: process.env.MAIL_FROM ?? "Loopwright <no-reply@loopwright.example>",
  s3Endpoint: process.env.S3_ENDPOINT ?? "http://127.0.0.1:4569",
  s3Bucket: process.env.S3_BUCKET ?? "loopwright-uploads",
  s3Region: process.env.S3_REGION ?? "us-east-1",
  s3AccessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER",
  s3SecretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER",
  demoSignIn: (process.env.DEMO_SIGN_IN ?? "true") === "true",
  secureCookies: (process.env.SECURE_COOKIES ?? "false") === "true",
};
