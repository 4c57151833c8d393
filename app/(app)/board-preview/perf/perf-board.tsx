"use client";
import { useMemo } from "react";
import { generateBuildingWithPipes as unitGrid } from "@/components/drawing-board/dev/generate";
import { generateBuildingWithPipes as building } from "@/lib/schematic/generate-building";
import { BoardPreview } from "../preview-client";

// Default: exactly 1,000 parts / 1,200 pipes (our unit grid). ?gen=building: the shared
// multi-storey generator with 1,200 pipes (about 780 parts), laid out as risers and floors.
export function PerfBoard({ gen }: { gen?: string }) {
  const doc = useMemo(() => (gen === "building" ? building(1200) : unitGrid(200)), [gen]);
  return <BoardPreview doc={doc} readOnly={false} />;
}
