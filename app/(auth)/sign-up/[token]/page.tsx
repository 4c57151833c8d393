import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ConfirmSignUpForm } from "@/components/auth/forms";
import { checkSignUpToken } from "@/lib/auth/sign-up";

export const metadata: Metadata = { title: "Finish creating your account" };
export const dynamic = "force-dynamic";

// The sign-up e-mail's link. Opening it changes nothing (mail scanners open links); the
// button does (lib/auth/sign-up.ts confirmSignUp).
export default async function ConfirmSignUpPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const check = token.length <= 200 ? await checkSignUpToken(token) : { ok: false as const, reason: "This sign-up link is not valid." };
  if (!check.ok) {
    return (
      <AuthCard title="This link cannot be used" footer={<Link href="/sign-in" className="font-medium text-copper-600 hover:underline">Go to sign in</Link>}>
        <p role="alert" className="text-sm text-ink-soft">{check.reason}</p>
        <Link href="/sign-up" className="mt-4 inline-block text-sm font-medium text-copper-600 hover:underline">Sign up again</Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Finish creating your account"
      lead={<>For <span className="font-medium text-ink">{check.email}</span>, owner of the new firm <span className="font-medium text-ink">{check.firm}</span>.</>}>
      <ConfirmSignUpForm token={token} />
    </AuthCard>
  );
}
