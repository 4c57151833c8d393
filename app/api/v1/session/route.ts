import { NextResponse } from "next/server";
import { apiHandler, requireUser } from "@/lib/auth/authorize";
import { signIn, signOut } from "@/lib/auth/accounts";
import { signInInput } from "@/lib/auth/schemas";
import { getCurrentUser } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

// The session as JSON, for API clients and tests: who am I, sign in, sign out. The pages
// use the server actions in app/(auth)/actions.ts, which call the same lib/auth code.

export const GET = apiHandler(async () => NextResponse.json({ user: await requireUser() }));

/** {email, password} → 200 {user} and the session cookie; 400 wrong details; 429 rate-limited. */
export const POST = apiHandler(async (req: Request) => {
  const input = signInInput.parse(await req.json());
  await signIn(input);
  return NextResponse.json({ user: await getCurrentUser() });
});

export const DELETE = apiHandler(async () => {
  await signOut(await getCurrentUser());
  return new NextResponse(null, { status: 204 });
});
