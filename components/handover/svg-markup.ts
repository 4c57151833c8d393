import { Fragment, isValidElement, type ReactNode } from "react";

// React SVG elements as markup text, for the drawing in the handover PDF and print view.
// Next.js refuses react-dom/server in route handlers, and the drawing sheet is plain SVG
// elements and hook-free function components (drawing-sheet.tsx), so they are walked here:
// components are called, host elements written with React's attribute names for SVG
// (camelCase presentation props → kebab-case; viewBox and other SVG camelCase names kept).
// svg-markup.test.ts checks the result equals react-dom/server's for the demo drawings.

const KEEP_CAMEL = new Set(["viewBox", "preserveAspectRatio", "gradientUnits", "gradientTransform", "patternUnits", "markerWidth", "markerHeight", "refX", "refY", "textLength", "lengthAdjust", "pathLength"]);
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#x27;" })[c]!);
const attrName = (k: string) => (k === "className" ? "class" : KEEP_CAMEL.has(k) || k.startsWith("data-") || k.startsWith("aria-") ? k : k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`));
const cssName = (k: string) => k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

function attrs(props: Record<string, unknown>): string {
  let out = "";
  for (const [k, v] of Object.entries(props)) {
    if (k === "children" || k === "key" || k === "ref" || v === undefined || v === null || v === false || typeof v === "function") continue;
    if (k === "style" && typeof v === "object") {
      out += ` style="${esc(Object.entries(v as Record<string, unknown>).map(([p, x]) => `${cssName(p)}:${String(x)}`).join(";"))}"`;
    } else out += ` ${attrName(k)}="${esc(v === true ? "" : String(v))}"`;
  }
  return out;
}

export function svgMarkup(node: ReactNode): string {
  if (node === null || node === undefined || typeof node === "boolean") return "";
  if (typeof node === "string" || typeof node === "number" || typeof node === "bigint") return esc(String(node));
  if (Array.isArray(node)) return node.map((n) => svgMarkup(n as ReactNode)).join("");
  if (!isValidElement(node)) return "";
  const { type, props } = node as { type: unknown; props: Record<string, unknown> };
  if (type === Fragment) return svgMarkup(props.children as ReactNode);
  if (typeof type === "function") return svgMarkup((type as (p: unknown) => ReactNode)(props));
  if (typeof type !== "string") return "";
  return `<${type}${attrs(props)}>${svgMarkup(props.children as ReactNode)}</${type}>`;
}
