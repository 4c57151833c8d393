import type { Metadata } from "next";
import Link from "next/link";
import { Fragment } from "react";
import { notFound } from "next/navigation";
import { can, requireProjectRole } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { getProjectHead } from "@/db/queries/project-admin";
import { listMembers } from "@/lib/team/members";
import { listPendingInvitations } from "@/lib/team/invitations";
import { FirmRuleForm } from "@/components/review/firm-rule-form";
import { firmRuleOf } from "@/lib/review/firm-rule";
import { InviteForm, RemoveMemberButton, RevokeInvitationButton, RoleSelect } from "@/components/team/team-forms";

export const metadata: Metadata = { title: "Team" };
export const dynamic = "force-dynamic";

const roleNote: Record<string, string> = {
  owner: "everything, plus members and invitations",
  designer: "draws, sizes, submits and issues",
  reviewer: "reads, comments, approves or sends back",
  installer: "issued revision and site sheet",
  trainee: "reads; private practice variants",
};

export default async function TeamPage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<{ joined?: string }> }) {
  const { projectId } = await params;
  const { joined } = await searchParams;
  const access = await pageAccess(() => requireProjectRole(projectId, "project.read"));
  if (!access.ok) return <NotAllowed message={access.message} />;
  const { user, role } = access.value;
  const manage = can(role, "members.manage");
  const [project, members, invitations, rule] = await Promise.all([
    getProjectHead(projectId), listMembers(projectId), manage ? listPendingInvitations(projectId) : Promise.resolve([]), firmRuleOf(projectId),
  ]);
  if (!project) notFound();

  return (
    <main className="mx-auto max-w-4xl px-4 py-8">
      <p className="text-sm text-ink-faint"><Link href="/projects" className="hover:text-copper-600">Projects</Link> / {project.name}</p>
      <h1 className="mt-1 text-2xl font-semibold">Team</h1>
      <p className="mt-1 text-sm text-ink-soft">
        Who works on {project.name} ({project.firm}) and what each can do. You are <span className="font-medium text-copper-700">{role}</span>.
      </p>
      {joined && <p role="status" className="mt-4 rounded-md border border-ok/30 bg-ok/5 px-3 py-2 text-sm text-ok">Welcome to {project.name}. You joined as {role}.</p>}

      <section className="mt-6 rounded-lg border border-ink/10 bg-white shadow-sm" aria-labelledby="members-h">
        <h2 id="members-h" className="border-b border-ink/10 px-4 py-3 font-semibold">Members <span className="num text-sm font-normal text-ink-faint">{members.length}</span></h2>
        <ul className="divide-y divide-ink/10" data-testid="member-list">
          {members.map((m) => (
            <li key={m.userId} className="flex flex-col gap-2 px-4 py-3 sm:flex-row sm:items-center sm:gap-4" data-testid={`member-${m.email}`}>
              <div className="min-w-0 flex-1">
                <p className="truncate font-medium">{m.name}{m.userId === user.id && <span className="ml-2 text-xs font-normal text-ink-faint">(you)</span>}</p>
                <p className="truncate text-sm text-ink-soft">{m.email}</p>
              </div>
              {manage ? (
                <div className="flex items-center gap-3">
                  <RoleSelect projectId={projectId} userId={m.userId} role={m.role} name={m.name} />
                  {m.userId !== user.id && <RemoveMemberButton projectId={projectId} userId={m.userId} name={m.name} />}
                </div>
              ) : (
                <div className="text-sm sm:text-right">
                  <span className="inline-block rounded-full bg-copper-50 px-2 py-0.5 font-medium capitalize text-copper-700">{m.role}</span>
                  <span className="ml-2 text-xs text-ink-faint sm:block sm:ml-0">{roleNote[m.role]}</span>
                </div>
              )}
            </li>
          ))}
        </ul>
      </section>

      <section className="mt-6 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-labelledby="review-rule-h">
        <h2 id="review-rule-h" className="mb-2 font-semibold">Review</h2>
        <FirmRuleForm projectId={projectId} firmName={rule.firmName} initial={rule.noSelfApproval} mayChange={rule.mayChange} />
      </section>

      {manage && (
        <>
          <section className="mt-6 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-labelledby="invite-h">
            <h2 id="invite-h" className="font-semibold">Invite someone</h2>
            <p className="mb-3 mt-1 text-sm text-ink-soft">They get an e-mail with a link that works once, for 7 days. New people create their account from it.</p>
            <InviteForm projectId={projectId} />
          </section>

          <section className="mt-6 rounded-lg border border-ink/10 bg-white shadow-sm" aria-labelledby="pending-h">
            <h2 id="pending-h" className="border-b border-ink/10 px-4 py-3 font-semibold">Pending invitations <span className="num text-sm font-normal text-ink-faint">{invitations.length}</span></h2>
            {invitations.length === 0 ? <p className="px-4 py-3 text-sm text-ink-faint">None waiting.</p> : (
              <ul className="divide-y divide-ink/10" data-testid="invitation-list">
                {invitations.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-sm">
                    <span className="min-w-0 flex-1 truncate font-medium">{i.email}</span>
                    <span className="capitalize text-copper-700">{i.role}</span>
                    <span className={i.expired ? "text-warn" : "text-ink-faint"}>
                      {i.expired ? "expired" : `until ${i.expiresAt.slice(0, 10)}`}{i.invitedBy ? ` · from ${i.invitedBy}` : ""}
                    </span>
                    <RevokeInvitationButton projectId={projectId} invitationId={i.id} />
                  </li>
                ))}
              </ul>
            )}
          </section>
        </>
      )}

      <section className="mt-6 text-sm text-ink-soft">
        <h2 className="font-semibold text-ink">What each role can do</h2>
        <dl className="mt-2 grid grid-cols-[6.5rem_1fr] gap-y-1">
          {Object.entries(roleNote).map(([r, note]) => (
            <Fragment key={r}><dt className="capitalize text-ink">{r}</dt><dd>{note}</dd></Fragment>
          ))}
        </dl>
      </section>
    </main>
  );
}
