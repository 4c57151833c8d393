"use client";

import { useMemo, useState, type ReactNode } from "react";
import { UnitsProvider } from "@/components/units/units-context";
import type { ProjectRole } from "@/lib/auth/policy";
import type { SchematicView } from "@/lib/persistence/schematic-view";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import type { UnitPrefs } from "@/lib/units/display";
import { fetchJson } from "@/lib/fetch-json";
import { BoardStoreProvider, createBoardStore } from "../store";
import { BoardSessionContext, type SizingMeta } from "./session-context";
import { ConflictDialog } from "./conflict-dialog";
import { useAutosave } from "./use-autosave";

interface Props {
  view: SchematicView;
  projectName: string;
  role: ProjectRole;
  canSize: boolean;
  units: UnitPrefs;
  children: ReactNode;
}

type Opened = { doc: Schematic; lockVersion: number; readOnly: boolean; key: number; sizing: SchematicView["sizing"] };

const keptOf = (sizing: SchematicView["sizing"], doc: Schematic) => (sizing ? { results: sizing.results, doc: sizing.sizedDocument ?? doc } : null);

/**
 * One open schematic: the board store, autosave and the conflict dialog. The
 * store is made here (one per opening) so "Reload theirs" can swap in a fresh
 * store with the stored draft by bumping `key`, without leaving the page.
 */
export function BoardSession({ view, projectName, role, canSize, units, children }: Props) {
  const canEdit = view.mayEdit;
  const first = parseSchematic(view.doc);
  const [opened, setOpened] = useState<Opened | null>(() =>
    first.ok ? { doc: first.doc, lockVersion: view.schematic.lockVersion, readOnly: view.readOnly, key: 0, sizing: view.sizing } : null);
  const [revisions, setRevisions] = useState(view.revisions);
  const [readOnlyReason, setReason] = useState(view.readOnlyReason);
  const store = useMemo(() => (opened ? createBoardStore(opened.doc, { readOnly: opened.readOnly, sizing: keptOf(opened.sizing, opened.doc) }) : null),
    // a new store only when a different draft is opened
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [opened?.key]);

  if (!first.ok || !opened || !store) {
    return (
      <div role="alert" className="m-6 rounded-md border border-fault/30 bg-white p-4 text-sm">
        <p className="font-medium text-fault">This schematic cannot be opened: the stored document is not valid.</p>
        <ul className="mt-2 list-disc pl-5 text-ink-soft">{!first.ok && first.issues.slice(0, 8).map((i) => <li key={i.path}>{i.message}</li>)}</ul>
      </div>
    );
  }

  const reload = async () => {
    const fresh = await fetchJson<SchematicView>(`/api/v1/schematics/${view.schematic.id}`);
    const parsed = parseSchematic(fresh.doc);
    if (!parsed.ok) throw new Error(parsed.issues[0]?.message ?? "The stored schematic is not valid.");
    setRevisions(fresh.revisions);
    setReason(fresh.readOnlyReason);
    setOpened({ doc: parsed.doc, lockVersion: fresh.schematic.lockVersion, readOnly: fresh.readOnly || !canEdit, key: opened.key + 1, sizing: fresh.sizing });
  };
  const unlock = (lockVersion: number) => {
    setReason(null);
    const { results, resultsDoc } = store.getState();
    setOpened({ doc: store.getState().doc, lockVersion, readOnly: false, key: opened.key + 1,
      sizing: results && opened.sizing ? { ...opened.sizing, results, sizedDocument: resultsDoc } : null });
  };

  return (
    <UnitsProvider initial={units}>
      <BoardStoreProvider key={opened.key} store={store} initialDoc={opened.doc} readOnly={opened.readOnly}>
        <Saving view={view} projectName={projectName} role={role} canSize={canSize} opened={opened} revisions={revisions}
          setRevisions={setRevisions} readOnlyReason={readOnlyReason} reload={reload} unlock={unlock}>
          {children}
        </Saving>
      </BoardStoreProvider>
    </UnitsProvider>
  );
}

/** Inside the store provider, so autosave can subscribe to the store. */
function Saving(p: Omit<Props, "units"> & { opened: Opened; revisions: SchematicView["revisions"]; setRevisions: (r: SchematicView["revisions"]) => void;
  readOnlyReason: SchematicView["readOnlyReason"]; reload: () => Promise<void>; unlock: (v: number) => void }) {
  const save = useAutosave(p.view.schematic.id, p.opened.lockVersion, !p.opened.readOnly);
  const [sizing, setSizing] = useState<SizingMeta | null>(() => metaOf(p.opened.sizing));
  const value = {
    schematicId: p.view.schematic.id, projectId: p.view.schematic.projectId, name: p.view.schematic.name, projectName: p.projectName, role: p.role,
    viewing: viewingNow(p.view.viewing, p.revisions), draftVisible: p.view.draftVisible, sizing, setSizing,
    canEdit: p.view.mayEdit && !p.opened.readOnly, mayEdit: p.view.mayEdit, canSize: p.canSize, readOnlyReason: p.readOnlyReason,
    revisions: p.revisions, setRevisions: p.setRevisions, save, reload: p.reload, unlock: p.unlock,
  };
  return (
    <BoardSessionContext.Provider value={value}>
      {p.children}
      <ConflictDialog open={save.status === "conflict"} />
    </BoardSessionContext.Provider>
  );
}

/** The revision opened, with its status as it is now (it moves while the board is open). */
function viewingNow(v: SchematicView["viewing"], revisions: SchematicView["revisions"]): SchematicView["viewing"] {
  return v.kind === "revision" ? { kind: "revision", revision: revisions.find((r) => r.id === v.revision.id) ?? v.revision } : v;
}

function metaOf(sizing: SchematicView["sizing"]): SizingMeta | null {
  return sizing ? { engineVersion: sizing.engineVersion, sizedAt: sizing.sizedAt, sizedBy: sizing.sizedBy, fromRevision: sizing.fromRevision,
    recomputed: sizing.recomputed } : null;
}
