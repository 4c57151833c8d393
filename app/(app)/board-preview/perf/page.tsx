import type { Metadata } from "next";
import { PerfBoard } from "./perf-board";

export const metadata: Metadata = { title: "Board speed check" };

// 1,000 parts / 1,200 pipes, generated in the browser (no 1 MB server payload).
export default async function PerfPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  return <PerfBoard gen={(await searchParams).gen} />;
}
