"use client";
/** The board's way in: "Handover pack" when an issued revision is open (the pack of what was built from). */
import Link from "next/link";
import { useBoardSession } from "@/components/drawing-board/persistence/session-context";

export function HandoverLink() {
  const s = useBoardSession();
  if (s.viewing.kind !== "revision" || s.viewing.revision.status !== "issued") return null;
  return (
    <Link href={`/projects/${s.projectId}/schematics/${s.schematicId}/handover?rev=${s.viewing.revision.id}`}
      className="rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-paper-dark hover:text-ink" data-testid="handover-board-link"
      title="The report, the materials list with prices, and sending the report to the client">
      Handover pack
    </Link>
  );
}
