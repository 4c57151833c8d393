/** Review threads and the revision history as the API answers them (client-safe). */
import type { DocDiff } from "@/lib/schematic/doc-diff";
import type { RevisionStatus } from "@/lib/revisions/transitions";

export type AnchorKind = "part" | "pipe" | "schematic";

export interface ThreadMessage {
  id: string;
  threadId: string;
  authorId: string | null;
  authorName: string | null;
  /** Plain text; empty once deleted. */
  body: string;
  mentions: string[];
  createdAt: string;
  editedAt: string | null;
  deleted: boolean;
}

export interface Thread {
  id: string;
  schematicId: string;
  /** Numbered per schematic, as on the canvas marker. */
  number: number;
  revisionId: string;
  revisionNumber: number;
  revisionStatus: RevisionStatus;
  anchor: { kind: AnchorKind; id: string | null };
  /** The part or pipe is in the document the list was read against (always true for the whole schematic). */
  anchorPresent: boolean;
  kind: "comment" | "send-back";
  createdBy: string | null;
  createdByName: string | null;
  createdAt: string;
  resolved: boolean;
  resolvedAt: string | null;
  resolvedByName: string | null;
  messages: ThreadMessage[];
}

export interface Person { id: string; name: string }

export interface RevisionEvent {
  kind: "status" | "restored" | "handover";
  from: RevisionStatus | null;
  to: RevisionStatus | null;
  actorId: string | null;
  actorName: string | null;
  at: string;
  /** The thread holding a send-back's reason. */
  threadId: string | null;
  reason: string | null;
  /** A handover: to whom the report went, and the file. */
  detail?: { to?: string; file?: string } | null;
}

export interface HistoryEntry {
  id: string;
  number: number;
  status: RevisionStatus;
  authorId: string | null;
  authorName: string | null;
  createdAt: string;
  statusChangedAt: string;
  message: string;
  /** From the revision before it (the first: everything added); positions and labels count. */
  changes: DocDiff;
  events: RevisionEvent[];
}

/** Someone looking at the board now (live presence). */
export interface Present { userId: string; name: string; initials: string }
