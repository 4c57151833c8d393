"use client";

import { useActionState } from "react";
import { changeRoleAction, inviteAction, removeMemberAction, revokeInvitationAction } from "@/components/team/actions";
import { Field, FormAlert, SubmitButton, fieldError, type FormResult } from "@/components/auth/form-bits";
import { projectRoles, type ProjectRole } from "@/lib/auth/policy";

// Owner-only controls on the Team screen. The server checks again; these are only shown
// to a role that may use them.

const selectClass = "rounded-md border border-ink/15 bg-white px-2 py-2 text-sm focus:border-copper-500 focus:outline-none focus:ring-2 focus:ring-copper-100";

export function InviteForm({ projectId }: { projectId: string }) {
  const [state, action] = useActionState<FormResult, FormData>(inviteAction, null);
  const roleErr = fieldError(state, "role");
  return (
    <form action={action} className="space-y-3" noValidate data-testid="invite-form">
      <FormAlert state={state} />
      <input type="hidden" name="projectId" value={projectId} />
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem_auto] sm:items-end">
        <Field key={state?.ok ? state.data : "email"} label="E-mail address" name="email" type="email" required placeholder="name@example.com" state={state} />
        <div>
          <label htmlFor="invite-role" className="block text-sm font-medium">Role</label>
          <select id="invite-role" name="role" defaultValue="designer" className={`mt-1 block w-full ${selectClass}`}>
            {projectRoles.map((r) => <option key={r} value={r}>{r}</option>)}
          </select>
          {roleErr && <p className="mt-1 text-xs text-fault">{roleErr}</p>}
        </div>
        <SubmitButton pending="Sending…" className="sm:mb-px">Send invitation</SubmitButton>
      </div>
    </form>
  );
}

export function RoleSelect({ projectId, userId, role, name }: { projectId: string; userId: string; role: ProjectRole; name: string }) {
  const [state, action] = useActionState<FormResult, FormData>(changeRoleAction, null);
  return (
    <form action={action} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="userId" value={userId} />
      <label className="sr-only" htmlFor={`role-${userId}`}>Role of {name}</label>
      <select id={`role-${userId}`} name="role" defaultValue={role} className={selectClass}
        onChange={(e) => e.currentTarget.form?.requestSubmit()}>
        {projectRoles.map((r) => <option key={r} value={r}>{r}</option>)}
      </select>
      {state && !state.ok && <p role="alert" className="w-full text-xs text-fault">{state.error}</p>}
      {state?.ok && <span role="status" className="text-xs text-ok">Saved</span>}
    </form>
  );
}

export function RemoveMemberButton({ projectId, userId, name }: { projectId: string; userId: string; name: string }) {
  const [state, action] = useActionState<FormResult, FormData>(removeMemberAction, null);
  return (
    <form action={action} onSubmit={(e) => { if (!confirm(`Remove ${name} from this project?`)) e.preventDefault(); }}>
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="userId" value={userId} />
      <button type="submit" className="text-xs text-ink-faint hover:text-fault hover:underline">Remove</button>
      {state && !state.ok && <p role="alert" className="text-xs text-fault">{state.error}</p>}
    </form>
  );
}

export function RevokeInvitationButton({ projectId, invitationId }: { projectId: string; invitationId: string }) {
  const [state, action] = useActionState<FormResult, FormData>(revokeInvitationAction, null);
  return (
    <form action={action}>
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="invitationId" value={invitationId} />
      <button type="submit" className="text-xs text-ink-faint hover:text-fault hover:underline">Withdraw</button>
      {state && !state.ok && <p role="alert" className="text-xs text-fault">{state.error}</p>}
    </form>
  );
}

