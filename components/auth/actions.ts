"use server";

import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/session";
import { requireUser, runAction, type ActionResult } from "@/lib/auth/authorize";
import * as accounts from "@/lib/auth/accounts";
import {
  changePasswordInput, forgotInput, formObject, inviteSignUpInput, resetInput, safeNext, signInInput, signUpInput, tokenField,
} from "@/lib/auth/schemas";
import { projectRoles } from "@/lib/auth/policy";
import { checkEmailMessage, confirmSignUp, requestSignUp } from "@/lib/auth/sign-up";
import { acceptInvitation, signUpWithInvitation } from "@/lib/team/invitations";

// Server actions for accounts. Each is (previous state, FormData) → ActionResult so forms
// can use useActionState; on success most redirect (Next's redirect passes through runAction).

export type FormState = ActionResult<string> | null;

export async function signInAction(_prev: FormState, fd: FormData): Promise<FormState> {
  let next = "/projects";
  const r = await runAction(async () => {
    const input = signInInput.parse(formObject(fd));
    next = safeNext(input.next);
    return accounts.signIn(input);
  });
  if (r.ok) redirect(next);
  return r;
}

/** Answers "check your e-mail" whether or not the address has an account (lib/auth/sign-up.ts). */
export async function signUpAction(_prev: FormState, fd: FormData): Promise<FormState> {
  return runAction(async () => {
    const input = signUpInput.parse(formObject(fd));
    await requestSignUp(input);
    return checkEmailMessage(input.email);
  });
}

/** The e-mailed link's button: makes the account and firm, signs in. */
export async function confirmSignUpAction(_prev: FormState, fd: FormData): Promise<FormState> {
  const r = await runAction(async () => confirmSignUp(tokenField.parse(fd.get("token"))));
  if (r.ok) redirect("/projects?welcome=1");
  return r;
}

export async function signOutAction(fd?: FormData): Promise<void> {
  await accounts.signOut(await getCurrentUser());
  const next = fd?.get("next");
  redirect(safeNext(typeof next === "string" ? next : null, "/"));
}

export async function demoSignInAction(fd: FormData): Promise<void> {
  const role = String(fd.get("role") ?? "");
  const r = (projectRoles as readonly string[]).includes(role) ? await runAction(() => accounts.signInAsDemo(role)) : null;
  // demo sign-in turned off, or the seed missing: the ordinary sign-in page instead
  redirect(r?.ok ? "/projects" : "/sign-in");
}

export async function forgotPasswordAction(_prev: FormState, fd: FormData): Promise<FormState> {
  return runAction(async () => {
    const { email } = forgotInput.parse(formObject(fd));
    await accounts.requestPasswordReset(email);
    return `If ${email} has a Loopwright account, a link to choose a new password is on its way. It works for one hour.`;
  });
}

export async function resetPasswordAction(_prev: FormState, fd: FormData): Promise<FormState> {
  const r = await runAction(async () => accounts.resetPassword(resetInput.parse(formObject(fd))));
  if (r.ok) redirect("/projects?password=reset");
  return r;
}

export async function changePasswordAction(_prev: FormState, fd: FormData): Promise<FormState> {
  return runAction(async () => {
    const user = await requireUser();
    await accounts.changePassword(user, changePasswordInput.parse(formObject(fd)));
    return "Password changed. Other devices have been signed out.";
  });
}

export async function inviteSignUpAction(_prev: FormState, fd: FormData): Promise<FormState> {
  const r = await runAction(async () => signUpWithInvitation(inviteSignUpInput.parse(formObject(fd))));
  if (r.ok) redirect(`/projects/${r.data}/team?joined=1`);
  return r;
}

export async function acceptInvitationAction(_prev: FormState, fd: FormData): Promise<FormState> {
  const r = await runAction(async () => acceptInvitation(await requireUser(), tokenField.parse(fd.get("token"))));
  if (r.ok) redirect(`/projects/${r.data}/team?joined=1`);
  return r;
}
