import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Metadata } from "next";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import { demoDoc } from "@/components/drawing-board/dev/demo-doc";
import { BoardPreview } from "./preview-client";

export const metadata: Metadata = { title: "Drawing board preview" };
export const dynamic = "force-dynamic";

const SEEDS = ["millbrook-hall", "orchard-end-bypass-only", "orchard-end-buffer-40l"];

/** A seed document from db/seeds/data, or the small built-in demo when it is missing or invalid. */
async function load(name: string): Promise<Schematic> {
  if (name === "demo" || !SEEDS.includes(name)) return demoDoc();
  try {
    const text = await readFile(path.join(process.cwd(), "db/seeds/data", `${name}.json`), "utf8");
    const parsed = parseSchematic(JSON.parse(text));
    return parsed.ok ? parsed.doc : demoDoc();
  } catch {
    return demoDoc();
  }
}

// Dev/demo page: the board before persistence is wired. ?doc=demo|<seed> &readonly=1 &empty=1
export default async function BoardPreviewPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const q = await searchParams;
  const doc = q.empty ? { ...demoDoc(), name: "Empty board", parts: [], pipes: [] } : await load(q.doc ?? "millbrook-hall");
  return <BoardPreview doc={doc} readOnly={q.readonly === "1"} />;
}
