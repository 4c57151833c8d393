import { portsOf, type Part } from "@/lib/schematic";

/**
 * portsOf with a cast: lib/schematic/schema.ts's generic `part()` helper loses
 * `props` from the inferred Part type for now (engine's TS2349 at schema.ts:26).
 * Remove the cast once that is fixed.
 */
export const partPorts = (part: Part): string[] => portsOf(part as unknown as Parameters<typeof portsOf>[0]);
