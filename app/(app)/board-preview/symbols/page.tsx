import type { Metadata } from "next";
import { partRegistry, partTypes, schematicSchema } from "@/lib/schematic";
import { BoardPreview } from "../preview-client";
import { SymbolSheet } from "./symbol-sheet";

export const metadata: Metadata = { title: "Part symbols" };

// Every part type twice: on a board (handles, tags) and as plain SVG at 50/100/200 %.
export default async function SymbolsPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const q = await searchParams;
  const parts = partTypes.map((type, i) => ({ id: type, type, x: (i % 7) * 160, y: Math.floor(i / 7) * 180, label: partRegistry[type].label }));
  const doc = schematicSchema.parse({ format: "loopwright/schematic", version: 1, name: "Symbol sheet", parts, pipes: [] });
  if (q.plain) return <SymbolSheet />;
  return <BoardPreview doc={doc} readOnly={false} />;
}
