import type { Metadata } from "next";
import { ChangePasswordForm } from "@/components/auth/forms";
import { requireUser } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const access = await pageAccess(requireUser);
  if (!access.ok) return <NotAllowed message={access.message} />;
  const user = access.value;
  return (
    <main className="mx-auto max-w-2xl px-4 py-8">
      <h1 className="text-2xl font-semibold">Your account</h1>
      <dl className="mt-4 grid grid-cols-[8rem_1fr] gap-y-1 text-sm">
        <dt className="text-ink-faint">Name</dt><dd>{user.name}</dd>
        <dt className="text-ink-faint">E-mail</dt><dd>{user.email}</dd>
      </dl>
      <section className="mt-8 rounded-lg border border-ink/10 bg-white p-5 shadow-sm">
        <h2 className="font-semibold">Change password</h2>
        <div className="mt-4 max-w-sm"><ChangePasswordForm /></div>
      </section>
    </main>
  );
}
