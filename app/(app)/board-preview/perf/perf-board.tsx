"use client";
import { useMemo } from "react";
import { generateBuildingWithPipes } from "@/components/drawing-board/dev/generate";
import { BoardPreview } from "../preview-client";

export function PerfBoard() {
  const doc = useMemo(() => generateBuildingWithPipes(200), []);
  return <BoardPreview doc={doc} readOnly={false} />;
}
