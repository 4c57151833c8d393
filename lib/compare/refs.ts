/**
 * What side by side compares: a schematic's working draft (`schematic:{id}`) or one of
 * its saved revisions (`revision:{id}`). Pure and client-safe: the compare API, its page,
 * the picker and every "compare" link write and read refs here.
 */
import { z } from "zod";

export type RefKind = "schematic" | "revision";
export interface Ref { kind: RefKind; id: string }

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const REF_HELP = "write a design as schematic:{id} (its working draft) or revision:{id}";

export function parseRef(text: string): Ref | null {
  const m = /^(schematic|revision):(.+)$/.exec(text.trim());
  return m && UUID.test(m[2]!) ? { kind: m[1] as RefKind, id: m[2]!.toLowerCase() } : null;
}

export const refText = (r: Ref) => `${r.kind}:${r.id}`;

/** A ref field in a zod schema: a message naming what a ref looks like when it does not parse. */
export const refSchema = z.string({ error: `missing: ${REF_HELP}` })
  .transform((s, ctx) => {
    const r = parseRef(s);
    if (!r) ctx.addIssue({ code: "custom", message: `"${s.slice(0, 80)}" is not a design reference: ${REF_HELP}` });
    return r ?? z.NEVER;
  });

/** The side by side page for two refs (either may be left open for the picker). */
export function compareHref(projectId: string, a?: string | null, b?: string | null): string {
  const q = new URLSearchParams();
  if (a) q.set("a", a);
  if (b) q.set("b", b);
  const s = q.toString();
  return `/projects/${projectId}/compare${s ? `?${s}` : ""}`;
}
