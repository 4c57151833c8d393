import "server-only";
import type { RevisionStatus } from "@/lib/revisions/transitions";

// snake_case rows → camelCase domain objects for schematics and their revisions.

export interface SchematicRecord {
  id: string;
  projectId: string;
  name: string;
  kind: "team" | "practice";
  ownerId: string | null;
  variantOf: string | null;
  /** The working draft as stored; run it through parseSchematic (which migrates) before use. */
  draft: unknown;
  lockVersion: number;
  updatedBy: string | null;
  updatedAt: string;
  createdAt: string;
}

export interface RevisionRecord {
  id: string;
  schematicId: string;
  number: number;
  status: RevisionStatus;
  message: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: string;
  statusChangedAt: string;
}

export interface SchematicSummary {
  id: string;
  name: string;
  kind: "team" | "practice";
  ownerId: string | null;
  ownerName: string | null;
  variantOf: string | null;
  updatedAt: string;
  latest: { number: number; status: RevisionStatus; message: string } | null;
  revisions: Pick<RevisionRecord, "id" | "number" | "status" | "message" | "authorName" | "createdAt">[];
}

type Row = Record<string, unknown>;
const iso = (v: unknown) => new Date(v as string).toISOString();

export function mapSchematic(r: Row): SchematicRecord {
  return {
    id: r.id as string, projectId: r.project_id as string, name: r.name as string,
    kind: r.kind as SchematicRecord["kind"], ownerId: (r.owner_id as string | null) ?? null,
    variantOf: (r.variant_of as string | null) ?? null, draft: r.draft, lockVersion: r.lock_version as number,
    updatedBy: (r.updated_by as string | null) ?? null, updatedAt: iso(r.updated_at), createdAt: iso(r.created_at),
  };
}

export function mapRevision(r: Row): RevisionRecord {
  return {
    id: r.id as string, schematicId: r.schematic_id as string, number: r.number as number,
    status: r.status as RevisionStatus, message: r.message as string, authorId: (r.author_id as string | null) ?? null,
    authorName: (r.author_name as string | null) ?? null, createdAt: iso(r.created_at), statusChangedAt: iso(r.status_changed_at),
  };
}
