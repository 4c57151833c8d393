import { NextResponse, type NextRequest } from "next/server";
import { config as app } from "@/lib/config";
import { actionRefusal } from "@/lib/http/action-guard";
import { pageContentSecurityPolicy } from "@/lib/http/security-headers.mjs";

// Every page request passes here (route handlers under /api have their own checks in
// apiHandler, and their headers in next.config.mjs):
// - server-action posts are checked before Next.js decodes them (lib/http/action-guard.ts);
// - each response gets a Content-Security-Policy with a fresh nonce, which Next.js reads
//   from the request's copy of the header and puts on its own scripts (the Next.js 16
//   guide "Content Security Policy"; the root layout renders every page per request);
// - the requested path is passed on as x-lw-path, so the signed-in area's layout can send
//   a signed-out visitor to /sign-in?next=<where they were going>.
// No auth decision is made here; lib/auth/authorize.ts does that.

const otherOrigins = [new URL(app.s3Endpoint).origin];
const https = app.appUrl.startsWith("https:");

export async function proxy(request: NextRequest) {
  const refused = await actionRefusal(request);
  if (refused) {
    // exactly "text/plain": the browser side of a server action then shows the text as the error
    return new NextResponse(refused.error, { status: refused.status, headers: { "content-type": "text/plain" } });
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = pageContentSecurityPolicy(nonce, { dev: process.env.NODE_ENV === "development", https, otherOrigins });
  const headers = new Headers(request.headers);
  headers.set("x-lw-path", request.nextUrl.pathname + request.nextUrl.search);
  headers.set("content-security-policy", csp);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", csp);
  return response;
}

export const config = { matcher: ["/((?!api/|_next/|favicon|fonts/).*)"] };
