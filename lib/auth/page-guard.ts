import "server-only";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { AuthError } from "./errors";

export type PageAccess<T> = { ok: true; value: T } | { ok: false; message: string };

/** Where a signed-out visitor was going (set by proxy.ts), for the sign-in page to send them back. */
export async function signInRedirect(): Promise<never> {
  const path = (await headers()).get("x-lw-path") ?? "/projects";
  redirect(`/sign-in?next=${encodeURIComponent(path)}`);
}

/**
 * A page's access check in one place: signed out → sign in and come back; not a member or
 * not found → the 404 page (so ids of other firms' work are not confirmed); a role that
 * lacks the right → the message, for the page to show instead of its content.
 */
export async function pageAccess<T>(check: () => Promise<T>): Promise<PageAccess<T>> {
  try {
    return { ok: true, value: await check() };
  } catch (e) {
    if (!(e instanceof AuthError)) throw e;
    if (e.status === 401) return signInRedirect();
    if (e.status === 404) notFound();
    return { ok: false, message: e.message };
  }
}
