"use client";
/** What changed from A to B, by id; a click on an id shows it in both drawings. */
import type { DocDiff } from "@/lib/schematic/doc-diff";
import { markColours, type MarkKind } from "./change-marks";

function Ids({ kind, ids, onShow }: { kind: MarkKind; ids: string[]; onShow: (id: string) => void }) {
  return (
    <>
      {ids.map((id, i) => (
        <span key={id}>
          {i > 0 && ", "}
          <button type="button" className="num underline decoration-dotted underline-offset-2 hover:text-copper-700" onClick={() => onShow(id)} data-change={kind} data-id={id}>{id}</button>
        </span>
      ))}
    </>
  );
}

const Dot = ({ kind }: { kind: MarkKind }) => <span className="mr-1 inline-block h-2.5 w-2.5 rounded-full" style={{ background: markColours[kind] }} aria-hidden />;

export function ChangeList({ changes, onShow }: { changes: DocDiff; onShow: (id: string) => void }) {
  const none = changes.added.length + changes.removed.length + changes.changed.length + changes.settings.length === 0;
  if (none) return <p className="text-sm text-ink-soft" data-testid="compare-changes">No differences: the two designs are the same for sizing.</p>;
  return (
    <ul className="space-y-1 text-sm" data-testid="compare-changes">
      {changes.added.length > 0 && <li><Dot kind="added" /><span className="font-medium">Added in B</span> ({changes.added.length}): <Ids kind="added" ids={changes.added} onShow={onShow} /></li>}
      {changes.removed.length > 0 && <li><Dot kind="removed" /><span className="font-medium">Only in A</span> ({changes.removed.length}): <Ids kind="removed" ids={changes.removed} onShow={onShow} /></li>}
      {changes.changed.length > 0 && (
        <li>
          <Dot kind="changed" /><span className="font-medium">Changed</span> ({changes.changed.length}):
          <ul className="ml-4 mt-0.5 space-y-0.5">
            {changes.changed.map((c) => <li key={c.id}><Ids kind="changed" ids={[c.id]} onShow={onShow} /> <span className="text-ink-soft">— {c.fields.join(", ")}</span></li>)}
          </ul>
        </li>
      )}
      {changes.settings.length > 0 && <li><span className="font-medium">Settings changed</span>: <span className="num text-ink-soft">{changes.settings.join(", ")}</span></li>}
    </ul>
  );
}
