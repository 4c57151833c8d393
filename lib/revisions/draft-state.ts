/**
 * Whether the working draft may be edited. Issued revisions are immutable and
 * "editing starts a new draft" (product.md): once the latest revision is issued,
 * the board opens read-only until someone starts a new draft, which touches the
 * draft after the issue time. Pure, so the page, the actions and the queries agree.
 */
import type { RevisionStatus } from "./transitions";

export interface DraftStateInput {
  draftUpdatedAt: string | Date;
  latest: { status: RevisionStatus; statusChangedAt: string | Date } | null;
}

export function draftIsReadOnly({ draftUpdatedAt, latest }: DraftStateInput): boolean {
  if (!latest || latest.status !== "issued") return false;
  return new Date(draftUpdatedAt).getTime() <= new Date(latest.statusChangedAt).getTime();
}
