/**
 * Revision status workflow (product.md: draft → in review → approved → issued).
 * Which role may make a move is lib/auth/policy's table (revision.submit,
 * revision.review, revision.issue); this file only says which move needs which
 * policy action, so the status bar and the server agree. Client-safe.
 */
import { can, type Action, type ProjectRole } from "@/lib/auth/policy";

export const revisionStatuses = ["draft", "in-review", "approved", "issued"] as const;
export type RevisionStatus = (typeof revisionStatuses)[number];

export interface Transition {
  from: RevisionStatus;
  to: RevisionStatus;
  /** Policy action the caller needs; also the audit verb. */
  action: Extract<Action, "revision.submit" | "revision.review" | "revision.issue">;
  label: string;
}

export const transitions: readonly Transition[] = [
  { from: "draft", to: "in-review", action: "revision.submit", label: "Submit for review" },
  { from: "in-review", to: "approved", action: "revision.review", label: "Approve" },
  { from: "in-review", to: "draft", action: "revision.review", label: "Send back" },
  { from: "approved", to: "issued", action: "revision.issue", label: "Issue" },
];

export function findTransition(from: RevisionStatus, to: RevisionStatus): Transition | undefined {
  return transitions.find((t) => t.from === from && t.to === to);
}

/** Moves this role may make from a status (the status bar shows only these). */
export function transitionsFor(from: RevisionStatus, role: ProjectRole | null): Transition[] {
  return transitions.filter((t) => t.from === from && role !== null && can(role, t.action));
}
