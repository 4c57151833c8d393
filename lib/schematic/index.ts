export * from "./schema";
export * from "./parts";
export { parseSchematic, formatPath, type Issue, type ParseResult } from "./parse";
export { migrate, currentVersion } from "./migrate";
export * from "./results";
