"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { runAction, type ActionResult } from "@/lib/auth/authorize";
import { formObject, inviteInput, roleChangeInput } from "@/lib/auth/schemas";
import { inviteMember, revokeInvitation } from "@/lib/team/invitations";
import { changeMemberRole, removeMember } from "@/lib/team/members";

// Team screen actions. The role checks live in lib/team/* (via lib/auth/authorize.ts);
// these only parse the form and refresh the page.

export type TeamState = ActionResult<string> | null;

function refresh(projectId: string) {
  try { revalidatePath(`/projects/${projectId}/team`); } catch { /* outside a Next request (tests) */ }
}

const idsInput = z.object({ projectId: z.string().max(64), invitationId: z.string().max(64) });
const memberInput = z.object({ projectId: z.string().max(64), userId: z.string().min(1).max(64) });

export async function inviteAction(_prev: TeamState, fd: FormData): Promise<TeamState> {
  return runAction(async () => {
    const { projectId, email, role } = inviteInput.parse(formObject(fd));
    await inviteMember(projectId, email, role);
    refresh(projectId);
    return `Invitation sent to ${email} as ${role}.`;
  });
}

export async function revokeInvitationAction(_prev: TeamState, fd: FormData): Promise<TeamState> {
  return runAction(async () => {
    const { projectId, invitationId } = idsInput.parse(formObject(fd));
    await revokeInvitation(projectId, invitationId);
    refresh(projectId);
    return "Invitation withdrawn.";
  });
}

export async function changeRoleAction(_prev: TeamState, fd: FormData): Promise<TeamState> {
  return runAction(async () => {
    const { projectId, userId, role } = roleChangeInput.parse(formObject(fd));
    await changeMemberRole(projectId, userId, role);
    refresh(projectId);
    return `Role changed to ${role}.`;
  });
}

export async function removeMemberAction(_prev: TeamState, fd: FormData): Promise<TeamState> {
  return runAction(async () => {
    const { projectId, userId } = memberInput.parse(formObject(fd));
    await removeMember(projectId, userId);
    refresh(projectId);
    return "Removed from the project.";
  });
}
