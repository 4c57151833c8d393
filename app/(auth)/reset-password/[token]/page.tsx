import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ResetPasswordForm } from "@/components/auth/forms";
import { checkResetToken } from "@/lib/auth/accounts";

export const metadata: Metadata = { title: "Choose a new password" };
export const dynamic = "force-dynamic";

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const check = token.length <= 200 ? await checkResetToken(token) : { ok: false as const, reason: "This password reset link is not valid." };
  if (!check.ok) {
    return (
      <AuthCard title="This link cannot be used" footer={<Link href="/sign-in" className="font-medium text-copper-600 hover:underline">Back to sign in</Link>}>
        <p role="alert" className="text-sm text-ink-soft">{check.reason}</p>
        <Link href="/forgot-password" className="mt-4 inline-block text-sm font-medium text-copper-600 hover:underline">Send me a new link</Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password" lead={<>For <span className="font-medium text-ink">{check.email}</span>. You will be signed in afterwards, and signed out everywhere else.</>}>
      <ResetPasswordForm token={token} />
    </AuthCard>
  );
}
