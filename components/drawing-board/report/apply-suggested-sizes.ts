// Moved to lib/schematic so the first-draft generator (lib/rooms/draft) sizes pipes the same way.
export * from "@/lib/schematic/apply-suggested-sizes";
