import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ForgotPasswordForm } from "@/components/auth/forms";

export const metadata: Metadata = { title: "Forgotten password" };

export default function ForgotPasswordPage() {
  return (
    <AuthCard
      title="Forgotten your password?"
      lead="Give us your e-mail address and we will send a link to choose a new one."
      footer={<Link href="/sign-in" className="font-medium text-copper-600 hover:underline">Back to sign in</Link>}
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
