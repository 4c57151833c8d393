import { NextResponse, type NextRequest } from "next/server";

// Passes the requested path to server components as a header, so the signed-in area's
// layout can send a signed-out visitor to /sign-in?next=<where they were going>.
// No auth decision is made here; lib/auth/authorize.ts does that.
export function proxy(request: NextRequest) {
  const headers = new Headers(request.headers);
  headers.set("x-lw-path", request.nextUrl.pathname + request.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = { matcher: ["/((?!api/|_next/|favicon|fonts/).*)"] };
