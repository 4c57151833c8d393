"use client";

import { createContext, useContext } from "react";
import type { ProjectRole } from "@/lib/auth/policy";
import type { RevisionRecord } from "@/db/queries/schematic-rows";
import type { Recomputed } from "@/lib/revisions/with-results";
import type { SaveStatus } from "./use-autosave";

/** Where the results shown came from. */
export interface SizingMeta {
  engineVersion: string;
  /** When the draft was sized (null: a revision's own results). */
  sizedAt: string | null;
  sizedBy: string | null;
  /** The draft shows the results of this revision (it was never sized itself). */
  fromRevision: number | null;
  /** Kept results of an older engine, sized again on opening: what differs. */
  recomputed: Recomputed;
}

/** What the toolbar pieces share about the open schematic and its saving. */
export interface BoardSessionValue {
  schematicId: string;
  projectId: string;
  name: string;
  projectName: string;
  role: ProjectRole;
  /** The working draft, or a saved revision opened read-only. */
  viewing: { kind: "draft" } | { kind: "revision"; revision: RevisionRecord };
  /** The caller may open the draft (installers may not). */
  draftVisible: boolean;
  sizing: SizingMeta | null;
  setSizing: (s: SizingMeta | null) => void;
  /** The board is editable now. */
  canEdit: boolean;
  /** The role may edit this schematic (even if the draft is locked by an issue). */
  mayEdit: boolean;
  canSize: boolean;
  readOnlyReason: "issued" | "role" | "revision" | null;
  revisions: RevisionRecord[];
  setRevisions: (r: RevisionRecord[]) => void;
  save: { status: SaveStatus; error: string | null; lockVersion: () => number; markSaved: (lockVersion: number) => void };
  /** Throw away this board and open the stored draft (after a conflict). */
  reload: () => Promise<void>;
  /** After "Start a new draft": the board becomes editable with this lock version. */
  unlock: (lockVersion: number) => void;
}

export const BoardSessionContext = createContext<BoardSessionValue | null>(null);

export function useBoardSession(): BoardSessionValue {
  const v = useContext(BoardSessionContext);
  if (!v) throw new Error("useBoardSession must be used inside <BoardSession>");
  return v;
}
