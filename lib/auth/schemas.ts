import { z } from "zod";
import { config } from "@/lib/config";
import { passwordWeakness } from "./password-strength";
import { projectRoles } from "./policy";

// Input shapes for accounts and teams. Every message names its field, so a form can show
// it beside the input and an API caller knows what to fix.
export const emailField = z
  .string({ error: "E-mail address is required." })
  .trim()
  .min(1, "E-mail address is required.")
  .max(254, "E-mail address must be at most 254 characters.")
  .pipe(z.email({ error: "E-mail address does not look right (expected something like name@example.com)." }))
  .transform((s) => s.toLowerCase());

export const passwordField = z
  .string({ error: "Password is required." })
  .min(10, "Password must be at least 10 characters.")
  .max(200, "Password must be at most 200 characters.");

export const nameField = z
  .string({ error: "Name is required." })
  .trim()
  .min(1, "Name is required.")
  .max(120, "Name must be at most 120 characters.");

export const firmNameField = z
  .string({ error: "Firm name is required." })
  .trim()
  .min(2, "Firm name must be at least 2 characters.")
  .max(160, "Firm name must be at most 160 characters.");

export const roleField = z.enum(projectRoles, { error: `Role must be one of: ${projectRoles.join(", ")}.` });

export const tokenField = z.string({ error: "The link is incomplete." }).trim().min(1, "The link is incomplete.").max(200, "The link is not valid.");

export const signInInput = z.object({
  email: emailField,
  password: z.string({ error: "Password is required." }).min(1, "Password is required.").max(200, "Password must be at most 200 characters."),
  next: z.string().max(500).optional(),
});

/** A new password must also not be easy to guess (./password-strength.ts), given what else the form says about the person. */
function hardToGuess<T extends { password: string }>(context: (v: T) => string[]) {
  return (v: T, ctx: z.RefinementCtx) => {
    // zod runs this even when a field failed; a password already refused for its length is not looked at again
    if (typeof v.password !== "string" || !passwordField.safeParse(v.password).success) return;
    const why = passwordWeakness(v.password, context(v));
    if (why) ctx.addIssue({ code: "custom", path: ["password"], message: why });
  };
}

export const signUpInput = z.object({ name: nameField, email: emailField, password: passwordField, firm: firmNameField })
  .superRefine(hardToGuess((v) => [v.name, v.email, v.firm]));
export const inviteSignUpInput = z.object({ token: tokenField, name: nameField, password: passwordField })
  .superRefine(hardToGuess((v) => [v.name]));
export const changePasswordInput = z.object({
  current: z.string({ error: "Current password is required." }).min(1, "Current password is required.").max(200, "Current password must be at most 200 characters."),
  password: passwordField,
}).superRefine(hardToGuess(() => []));
export const forgotInput = z.object({ email: emailField });
export const resetInput = z.object({ token: tokenField, password: passwordField }).superRefine(hardToGuess(() => []));
export const inviteInput = z.object({ projectId: z.string().max(64), email: emailField, role: roleField });
export const roleChangeInput = z.object({ projectId: z.string().max(64), userId: z.string().min(1).max(64), role: roleField });

/** FormData → plain object of its string fields, for zod. */
export function formObject(fd: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of fd.entries()) if (typeof v === "string" && !k.startsWith("$ACTION")) out[k] = v;
  return out;
}

/**
 * Where to go after signing in or out: only a path on this app. The raw value may hold no
 * control characters (browsers drop tabs and newlines from URLs, so "/\t/evil.example" is
 * "//evil.example") and no backslashes (read as "/"); what is left is resolved against the
 * app's own origin by the URL parser and kept only when it stays there.
 */
export function safeNext(next: string | undefined | null, fallback = "/projects"): string {
  if (!next || !next.startsWith("/") || /[\u0000-\u001f\u007f\\]/.test(next)) return fallback;
  try {
    const base = new URL(config.appUrl);
    const url = new URL(next, base);
    return url.origin === base.origin ? `${url.pathname}${url.search}${url.hash}` : fallback;
  } catch {
    return fallback;
  }
}
