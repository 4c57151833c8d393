import "server-only";
import nodemailer from "nodemailer";
import { config } from "@/lib/config";

// Outgoing e-mail through nodemailer over SMTP. Locally that is maildev, which
// `npm start` / `npm test` run (see scripts/common.sh) and /dev/mail lists.
import type { Message } from "./message";

export type { Message };

const g = globalThis as unknown as { __loopwrightMailer?: ReturnType<typeof nodemailer.createTransport> };

function transport() {
  g.__loopwrightMailer ??= nodemailer.createTransport({
    host: config.smtpHost, port: config.smtpPort, secure: false, ignoreTLS: config.smtpHost === "127.0.0.1",
    connectionTimeout: 5_000, greetingTimeout: 5_000, socketTimeout: 10_000,
  });
  return g.__loopwrightMailer;
}

export async function sendMail(m: Message): Promise<void> {
  await transport().sendMail({ from: config.mailFrom, ...m });
}

export * from "./templates";
export * from "./review-templates";
export * from "./handover-template";
