import "server-only";
import { runAction, type ActionResult } from "@/lib/auth/authorize";
import type { Issue } from "@/lib/schematic";
import type { WriteRefusal } from "@/db/queries/schematics";

/**
 * Answers lib/auth's runAction cannot express: a document refused with its
 * JSON-path issues (400) and a write refused with the current lock version
 * (409). Actions return these markers; `runChecked` turns them into failures of
 * the same ActionResult shape, so clients handle one union.
 */
export class Refused {
  readonly ok = false as const;
  constructor(readonly status: number, readonly error: string, readonly extra: { issues?: Issue[]; currentLockVersion?: number } = {}) {}
}

export type Checked<T> = ActionResult<T> | { ok: false; status: number; error: string; issues?: Issue[]; currentLockVersion?: number };

export async function runChecked<T>(fn: () => Promise<T | Refused>): Promise<Checked<T>> {
  const r = await runAction(fn);
  if (r.ok && r.data instanceof Refused) return { ok: false, status: r.data.status, error: r.data.error, ...r.data.extra };
  return r as ActionResult<T>;
}

export function invalidDocument(issues: Issue[]): Refused {
  const shown = issues.slice(0, 3).map((i) => i.message).join("; ");
  const more = issues.length > 3 ? ` (and ${issues.length - 3} more)` : "";
  return new Refused(400, `The schematic is not valid: ${shown}${more}`, { issues });
}

export const CONFLICT_MESSAGE = "Someone else saved this schematic since you opened it.";

export function refusal(r: WriteRefusal): Refused {
  switch (r.reason) {
    case "conflict": return new Refused(409, CONFLICT_MESSAGE, { currentLockVersion: r.currentLockVersion });
    case "not-found": return new Refused(404, "Schematic not found.");
    case "read-only": return new Refused(409, "The latest revision is issued and read-only; start a new draft to edit.");
    case "duplicate-name": return new Refused(409, "A schematic with that name already exists in this project.");
  }
}

/** The HTTP twin of a Refused, for route handlers. */
export function refusedResponse(r: Refused): Response {
  return Response.json({ error: r.error, ...r.extra }, { status: r.status });
}
