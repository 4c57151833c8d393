import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { AcceptInvitationForm, InviteSignUpForm } from "@/components/auth/forms";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { getCurrentUser } from "@/lib/auth/session";
import { invitedIs, lookupInvitation, notYourInvitation } from "@/lib/team/invitations";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length <= 200 ? await lookupInvitation(token) : { ok: false as const, reason: "This invitation link is not valid." };
  if (!inv.ok) {
    return (
      <AuthCard title="This invitation cannot be used" footer={<Link href="/sign-in" className="font-medium text-copper-600 hover:underline">Go to sign in</Link>}>
        <p role="alert" className="text-sm text-ink-soft">{inv.reason}</p>
      </AuthCard>
    );
  }
  const user = await getCurrentUser();
  const lead = (
    <>
      {inv.invitedBy ?? "A project owner"} at {inv.firmName} invited <span className="font-medium text-ink">{inv.email}</span> to{" "}
      <span className="font-medium text-ink">{inv.projectName}</span> as <span className="font-medium text-copper-700">{inv.role}</span>.
    </>
  );
  const next = `/invite/${token}`;
  if (user && !invitedIs(inv.email, user)) {
    return (
      <AuthCard title={`Join ${inv.projectName}`} lead={lead}>
        <p role="alert" className="mb-4 rounded-md border border-warn/30 bg-warn/5 px-3 py-2 text-sm text-ink-soft">{notYourInvitation(inv.email, user).message}</p>
        <div className="text-center text-sm"><SignOutButton label="Sign out and use the invited address" next={next} /></div>
      </AuthCard>
    );
  }
  if (user) {
    return (
      <AuthCard title={`Join ${inv.projectName}`} lead={lead}>
        <AcceptInvitationForm token={token} label={`Join as ${inv.role}`} />
      </AuthCard>
    );
  }
  if (inv.hasAccount) {
    return (
      <AuthCard title={`Join ${inv.projectName}`} lead={lead}>
        <p className="text-sm text-ink-soft">There is already a Loopwright account for {inv.email}. Sign in with it, and this page will let you join.</p>
        <Link href={`/sign-in?next=${encodeURIComponent(next)}&email=${encodeURIComponent(inv.email)}`}
          className="mt-4 inline-flex w-full items-center justify-center rounded-md bg-copper-500 px-3 py-2 text-sm font-medium text-white hover:bg-copper-600">Sign in to join</Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title={`Join ${inv.projectName}`} lead={lead}
      footer={<>Already use Loopwright with another address? <Link href={`/sign-in?next=${encodeURIComponent(next)}`} className="font-medium text-copper-600 hover:underline">Sign in</Link></>}>
      <InviteSignUpForm token={token} email={inv.email} />
    </AuthCard>
  );
}
