"use client";

import { createContext, useContext } from "react";
import type { ProjectRole } from "@/lib/auth/policy";
import type { RevisionRecord } from "@/db/queries/schematic-rows";
import type { SaveStatus } from "./use-autosave";

/** What the toolbar pieces share about the open schematic and its saving. */
export interface BoardSessionValue {
  schematicId: string;
  projectId: string;
  name: string;
  role: ProjectRole;
  /** The board is editable now. */
  canEdit: boolean;
  /** The role may edit this schematic (even if the draft is locked by an issue). */
  mayEdit: boolean;
  canSize: boolean;
  readOnlyReason: "issued" | "role" | null;
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
