import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/auth-card";
import { SignUpForm } from "@/components/auth/forms";
import { getCurrentUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage() {
  if (await getCurrentUser()) redirect("/projects");
  return (
    <AuthCard
      title="Create an account"
      lead="Start a firm on Loopwright. Joining a colleague's project? Use the link in their invitation e-mail instead."
      footer={<>Already have an account? <Link href="/sign-in" className="font-medium text-copper-600 hover:underline">Sign in</Link></>}
    >
      <SignUpForm />
    </AuthCard>
  );
}
