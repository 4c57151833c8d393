/** An engine context for a document that must parse, with its findings, for tests that call engine steps directly. */
import { Findings } from "@/lib/hydraulics/findings/finding";
import { createContext, type EngineContext } from "@/lib/hydraulics/sizing/context";
import { parseSchematic } from "@/lib/schematic/parse";

export function contextOf(doc: unknown): { ctx: EngineContext; findings: Findings } {
  const parsed = parseSchematic(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const findings = new Findings();
  return { ctx: createContext(parsed.doc, findings), findings };
}
