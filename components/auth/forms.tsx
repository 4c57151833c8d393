"use client";

import Link from "next/link";
import { useActionState } from "react";
import {
  acceptInvitationAction, changePasswordAction, confirmSignUpAction, forgotPasswordAction, inviteSignUpAction, resetPasswordAction, signInAction, signUpAction,
} from "@/components/auth/actions";
import { Field, FormAlert, SubmitButton, type FormResult } from "./form-bits";

// One client component per account form; each posts to its server action.

export function SignInForm({ next, email }: { next?: string; email?: string }) {
  const [state, action] = useActionState<FormResult, FormData>(signInAction, null);
  return (
    <form action={action} className="space-y-4" noValidate>
      <FormAlert state={state} />
      <input type="hidden" name="next" value={next ?? ""} />
      <Field label="E-mail address" name="email" type="email" autoComplete="email" required defaultValue={email} state={state} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required state={state} />
      <SubmitButton pending="Signing in…">Sign in</SubmitButton>
      <p className="text-center text-sm"><Link href="/forgot-password" className="text-copper-600 hover:underline">Forgotten your password?</Link></p>
    </form>
  );
}

export function SignUpForm() {
  const [state, action] = useActionState<FormResult, FormData>(signUpAction, null);
  if (state?.ok) return <FormAlert state={state} />; // "check your e-mail": the rest happens from the link
  return (
    <form action={action} className="space-y-4" noValidate>
      <FormAlert state={state} />
      <Field label="Your name" name="name" autoComplete="name" required maxLength={120} state={state} />
      <Field label="E-mail address" name="email" type="email" autoComplete="email" required state={state} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required state={state} hint="At least 10 characters, not easy to guess." />
      <Field label="Firm name" name="firm" autoComplete="organization" required maxLength={160} state={state} hint="Your projects belong to this firm; you can invite colleagues to them." />
      <SubmitButton pending="Sending…">Create account</SubmitButton>
    </form>
  );
}

export function ConfirmSignUpForm({ token }: { token: string }) {
  const [state, action] = useActionState<FormResult, FormData>(confirmSignUpAction, null);
  return (
    <form action={action} className="space-y-4">
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <SubmitButton pending="Creating your account…">Create my account</SubmitButton>
    </form>
  );
}

export function ForgotPasswordForm() {
  const [state, action] = useActionState<FormResult, FormData>(forgotPasswordAction, null);
  return (
    <form action={action} className="space-y-4" noValidate>
      <FormAlert state={state} />
      <Field label="E-mail address" name="email" type="email" autoComplete="email" required state={state} />
      <SubmitButton pending="Sending…">Send me a link</SubmitButton>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string }) {
  const [state, action] = useActionState<FormResult, FormData>(resetPasswordAction, null);
  return (
    <form action={action} className="space-y-4" noValidate>
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" required state={state} hint="At least 10 characters." />
      <SubmitButton pending="Saving…">Save and sign in</SubmitButton>
    </form>
  );
}

export function InviteSignUpForm({ token, email }: { token: string; email: string }) {
  const [state, action] = useActionState<FormResult, FormData>(inviteSignUpAction, null);
  return (
    <form action={action} className="space-y-4" noValidate>
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <div>
        <span className="block text-sm font-medium text-ink">E-mail address</span>
        <p className="mt-1 rounded-md border border-ink/10 bg-paper px-3 py-2 text-sm text-ink-soft">{email}</p>
      </div>
      <Field label="Your name" name="name" autoComplete="name" required maxLength={120} state={state} />
      <Field label="Choose a password" name="password" type="password" autoComplete="new-password" required state={state} hint="At least 10 characters." />
      <SubmitButton pending="Creating your account…">Create account and join</SubmitButton>
    </form>
  );
}

export function AcceptInvitationForm({ token, label }: { token: string; label: string }) {
  const [state, action] = useActionState<FormResult, FormData>(acceptInvitationAction, null);
  return (
    <form action={action} className="space-y-4">
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <SubmitButton pending="Joining…">{label}</SubmitButton>
    </form>
  );
}

export function ChangePasswordForm() {
  const [state, action] = useActionState<FormResult, FormData>(changePasswordAction, null);
  return (
    <form action={action} className="space-y-4" noValidate key={state?.ok ? "done" : "form"}>
      <FormAlert state={state} />
      <Field label="Current password" name="current" type="password" autoComplete="current-password" required state={state} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" required state={state} hint="At least 10 characters. Other devices will be signed out." />
      <SubmitButton pending="Saving…" className="">Change password</SubmitButton>
    </form>
  );
}
