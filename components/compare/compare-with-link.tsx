"use client";
/** The board's way in: "Compare with…" opens side by side with what is open here as A. */
import Link from "next/link";
import { useBoardSession } from "@/components/drawing-board/persistence/session-context";
import { can } from "@/lib/auth/policy";
import { compareHref } from "@/lib/compare/refs";

export function CompareWithLink() {
  const s = useBoardSession();
  if (!can(s.role, "variant.compare")) return null;
  const here = s.viewing.kind === "revision" ? `revision:${s.viewing.revision.id}` : `schematic:${s.schematicId}`;
  return (
    <Link href={compareHref(s.projectId, here)} className="rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-paper-dark hover:text-ink" data-testid="compare-with"
      title="See this design beside another: its revisions or the project's variants">
      Compare with…
    </Link>
  );
}
