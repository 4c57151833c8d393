import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/forms";
import { safeNext } from "@/lib/auth/schemas";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; email?: string }> }) {
  const { next, email } = await searchParams;
  if (await getCurrentUser()) redirect(safeNext(next));
  return (
    <AuthCard
      title="Sign in"
      lead="Welcome back. Your projects are where you left them."
      footer={<>New to Loopwright? <Link href="/sign-up" className="font-medium text-copper-600 hover:underline">Create an account</Link></>}
    >
      <SignInForm next={typeof next === "string" ? next : undefined} email={typeof email === "string" ? email.slice(0, 254) : undefined} />
    </AuthCard>
  );
}
