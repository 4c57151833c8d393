"use client";
import { useEffect, useMemo, useState } from "react";
import type { SiteSheet } from "@/lib/site/site-view";
import type { PublicAttachment } from "@/lib/storage/uploads";
import type { OutboxItem, OutboxPhoto } from "./offline/store";
import { bigButton, Field, Select } from "./field";

const MB = 1024 * 1024;
const limitFor = (type: string) => (type === "application/pdf" ? 25 * MB : 15 * MB);

function Placeholder({ text }: { text: string }) {
  return <span className="flex h-20 w-20 shrink-0 items-center justify-center rounded bg-paper-dark text-sm font-bold">{text}</span>;
}

/** The photo as taken, from the phone's own copy (a blob: URL) until the server has its thumbnail. */
function Preview({ p }: { p: OutboxPhoto }) {
  const [broken, setBroken] = useState(false);
  const url = useMemo(() => (p.contentType.startsWith("image/") ? URL.createObjectURL(p.file) : null), [p.file, p.contentType]);
  useEffect(() => () => { if (url) URL.revokeObjectURL(url); }, [url]);
  if (!url || broken) return <Placeholder text={p.contentType === "application/pdf" ? "PDF" : "file"} />;
  return <img src={url} alt={p.filename} onError={() => setBroken(true)} className="h-20 w-20 shrink-0 rounded object-cover" />;
}

/** Photos and documents: camera or file, pinned to the project or a part or pipe; sent when there is a network. */
export function PhotosPanel({ sheet, items, attachments, pinTo, onAdd }: {
  sheet: SiteSheet; items: OutboxItem[]; attachments: PublicAttachment[] | null; pinTo: string | null;
  onAdd: (file: File, target: OutboxPhoto["target"]) => Promise<void>;
}) {
  const [pin, setPin] = useState(pinTo ?? "");
  const [error, setError] = useState<string | null>(null);
  useEffect(() => setPin(pinTo ?? ""), [pinTo]);
  const waiting = items.filter((i): i is OutboxPhoto => i.type === "photo");
  const label = (id: string | null | undefined) => (id ? (sheet.rows[id]?.kind === "part" ? `${(sheet.rows[id] as { label: string }).label} (${id})` : `pipe ${id}`) : "this schematic");

  const take = async (files: FileList | null) => {
    const file = files?.[0];
    if (!file) return;
    if (file.size > limitFor(file.type)) { setError(`"${file.name}" is ${(file.size / MB).toFixed(1)} MB: photos may be at most 15 MB and PDFs 25 MB.`); return; }
    setError(null);
    await onAdd(file, pin ? { schematicId: sheet.schematic.id, id: pin } : { schematicId: sheet.schematic.id });
  };

  return (
    <div className="space-y-3 px-3 py-3">
      <h2 className="text-lg font-bold">Photos and documents</h2>
      {sheet.me.mayRecord && (
        <>
          <Field label="Pin to">
            <Select value={pin} onChange={(e) => setPin(e.target.value)} data-testid="photo-pin">
              <option value="">This schematic (no part or pipe)</option>
              {sheet.groups.flatMap((g) => g.rows).map((id) => <option key={id} value={id}>{label(id)}</option>)}
            </Select>
          </Field>
          <div className="grid grid-cols-2 gap-3">
            <label className={`${bigButton()} cursor-pointer`}>
              Take photo
              <input type="file" accept="image/*" capture="environment" className="sr-only" data-testid="photo-camera" onChange={(e) => { void take(e.target.files); e.target.value = ""; }} />
            </label>
            <label className={`${bigButton("secondary")} cursor-pointer`}>
              Pick file
              <input type="file" accept="image/jpeg,image/png,image/webp,application/pdf" className="sr-only" data-testid="photo-file" onChange={(e) => { void take(e.target.files); e.target.value = ""; }} />
            </label>
          </div>
          <p className="text-sm text-ink-soft">Photos up to 15 MB, PDFs up to 25 MB. The server checks what each file really is before it is listed.</p>
          {error && <p role="alert" className="text-sm font-semibold text-fault">{error}</p>}
        </>
      )}
      <ul className="space-y-2">
        {waiting.map((p) => (
          <li key={p.id} className="flex gap-3 rounded-md border border-ink/15 bg-white p-2" data-testid="photo-waiting" data-state={p.state}>
            <Preview p={p} />
            <div className="min-w-0 text-sm">
              <p className="truncate font-semibold">{p.filename}</p>
              <p>On {p.target ? label(p.target.id) : "the project"}</p>
              {p.state === "waiting" ? <p className="font-semibold text-warn">waiting to send</p> : <p className="font-semibold text-fault">refused: {p.error}</p>}
            </div>
          </li>
        ))}
        {(attachments ?? []).map((a) => (
          <li key={a.id} className="flex gap-3 rounded-md border border-ink/15 bg-white p-2" data-testid="photo-listed" data-id={a.id}>
            {a.thumbnailUrl ? <img src={a.thumbnailUrl} alt={a.fileName} className="h-20 w-20 rounded object-cover" data-testid="photo-thumb" />
              : <Placeholder text="PDF" />}
            <div className="min-w-0 text-sm">
              <a href={a.url} target="_blank" rel="noreferrer" className="block truncate font-semibold text-copper-700 underline">{a.fileName}</a>
              <p>On {a.target?.schematicId === sheet.schematic.id ? label(a.target.id) : a.target ? "another schematic" : "the project"}</p>
              <p className="text-ink-soft">{a.uploadedBy.name ?? "someone"} · {new Date(a.createdAt).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" })}</p>
            </div>
          </li>
        ))}
        {attachments === null && <li className="text-sm text-ink-soft">The list of photos shows once the phone has been online here.</li>}
      </ul>
    </div>
  );
}
