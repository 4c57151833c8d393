"use client";
/**
 * The rooms page: the rooms table (edit, save, import, export), the flow
 * temperature check of what is saved, the first-draft form and the firm's
 * emitter list. Saving goes through PUT …/rooms with the lock version seen, so
 * two people editing at once do not overwrite each other unknowingly.
 */
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import type { EmitterEntry, Room } from "@/lib/rooms/schema";
import { ApiError, roomsApi } from "./api";
import { CsvImport } from "./csv-import";
import { DraftForm } from "./draft-form";
import { EmitterList } from "./emitter-list";
import { FlowCheck } from "./flow-check";
import { emptyRow, roomToRow, rowProblems, rowToRoom, type ColumnKey, type RoomRow } from "./room-rows";
import { RoomsTable } from "./rooms-table";

export function RoomsWorkspace({ projectId, initialRooms, initialLockVersion, emitters, canEdit, canDraft, practice }: {
  projectId: string; initialRooms: Room[]; initialLockVersion: number; emitters: EmitterEntry[]; canEdit: boolean; canDraft: boolean; practice: boolean;
}) {
  const [saved, setSaved] = useState(initialRooms);
  const [lockVersion, setLockVersion] = useState(initialLockVersion);
  const [rows, setRows] = useState<RoomRow[]>(() => initialRooms.map(roomToRow));
  const [importing, setImporting] = useState(false);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [flowC, setFlowC] = useState(45);
  const [deltaK, setDeltaK] = useState(5);
  const [version, setVersion] = useState(0);

  const problems = useMemo(() => rowProblems(rows), [rows]);
  const dirty = useMemo(() => JSON.stringify(rows.map(rowToRoom)) !== JSON.stringify(saved.map((r) => rowToRoom(roomToRow(r)))), [rows, saved]);
  const change = (i: number, key: ColumnKey, value: string) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, [key]: value } : r)));

  const applySaved = (rooms: Room[], lock: number) => {
    setSaved(rooms);
    setRows(rooms.map(roomToRow));
    setLockVersion(lock);
    setVersion((v) => v + 1);
  };
  const save = async () => {
    if (!canEdit || busy) return;
    if (problems.size) return setMessage({ kind: "error", text: `${problems.size} ${problems.size === 1 ? "cell needs" : "cells need"} fixing before saving.` });
    setBusy(true);
    try {
      const r = await roomsApi.put(projectId, rows.map(rowToRoom), lockVersion);
      applySaved(r.rooms, r.lockVersion);
      setMessage({ kind: "ok", text: `Saved ${r.rooms.length} rooms.` });
    } catch (e) {
      setMessage({ kind: "error", text: (e as Error).message });
      if (e instanceof ApiError && e.status === 409) setLockVersion(Number(e.body.currentLockVersion ?? lockVersion));
    } finally {
      setBusy(false);
    }
  };
  const imported = async () => {
    const r = await roomsApi.get(projectId);
    applySaved(r.rooms, r.lockVersion);
    setImporting(false);
    setMessage({ kind: "ok", text: `Imported ${r.rooms.length} rooms.` });
  };

  return (
    <>
      <section className="mt-6" aria-labelledby="rooms-h">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="rooms-h" className="text-lg font-semibold">Rooms <span className="num text-sm font-normal text-ink-faint">{saved.length}</span></h2>
          <div className="flex flex-wrap items-center gap-2">
            {canEdit && <Button variant="secondary" onClick={() => setImporting((x) => !x)} aria-expanded={importing}>Import CSV</Button>}
            <a href={roomsApi.csvUrl(projectId, "rooms")} download className="rounded-md border border-ink/15 bg-white px-3 py-2 text-sm font-medium hover:bg-paper-dark">Export CSV</a>
          </div>
        </div>
        {importing && <CsvImport projectId={projectId} currentCount={saved.length} onImported={imported} onClose={() => setImporting(false)} />}
        <p className="mt-2 text-xs text-ink-faint">{canEdit ? "Tab across, ↑ ↓ or Enter between rows (Enter on the last row adds one), Esc undoes a cell, Ctrl+S saves." : "Only owners and designers change rooms."}</p>
        <div className="mt-2"><RoomsTable rows={rows} problems={problems} editable={canEdit} onChange={change} onSave={save}
          onAdd={() => setRows((rs) => [...rs, emptyRow()])} onRemove={(i) => setRows((rs) => rs.filter((_, j) => j !== i))} /></div>
        {canEdit && (
          <div className="mt-3 flex flex-wrap items-center gap-2">
            <Button variant="secondary" onClick={() => setRows((rs) => [...rs, emptyRow()])}>Add room</Button>
            <Button onClick={save} disabled={busy || !dirty}>{busy ? "Saving…" : "Save rooms"}</Button>
            {dirty && <Button variant="ghost" onClick={() => setRows(saved.map(roomToRow))}>Revert</Button>}
            {dirty && <span className="text-xs text-warn">Unsaved changes: the check and the draft use the saved rooms.</span>}
          </div>
        )}
        {message && <p role={message.kind === "error" ? "alert" : "status"} className={`mt-2 text-sm ${message.kind === "error" ? "text-fault" : "text-ok"}`}>{message.text}</p>}
      </section>
      <FlowCheck projectId={projectId} flowC={flowC} deltaK={deltaK} version={version} onTemperatures={(f, d) => { setFlowC(f); setDeltaK(d); }} />
      {canDraft && <DraftForm key={saved.map((r) => r.name).join("\u0000")} projectId={projectId} rooms={saved} flowC={flowC} deltaK={deltaK} practice={practice} />}
      <EmitterList projectId={projectId} initial={emitters} editable={canEdit} onChanged={() => setVersion((v) => v + 1)} />
      <p className="mt-8 text-xs text-ink-faint">Results are design aids to be checked by a competent person; follow local codes, manufacturers&apos; instructions and licensed practice.</p>
    </>
  );
}
