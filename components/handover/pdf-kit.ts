import fs from "node:fs";
import path from "node:path";
import type PDFDocument from "pdfkit";
import { woffToSfnt } from "./woff-to-sfnt";

// Shared pieces of the handover PDF: page geometry, colours, and the embedded IBM Plex fonts
// (IBM's complete WOFF files, which hold the arrows and Greek letters the report writes;
// fontkit cannot subset the @fontsource WOFF/WOFF2 subsets the pages use).

export type Doc = InstanceType<typeof PDFDocument>;

export const PAGE = { margin: 48, footer: 28 } as const;
export const INK = "#1f1d1a";
export const SOFT = "#4a453e";
export const FAINT = "#8a8378";
export const COPPER = "#b4632b";
export const COPPER_DARK = "#7c411b";
export const RULE = "#e4ddd2";
export const WARN = "#9a5b00";

const fontDir = () => path.join(process.cwd(), "node_modules/@ibm");
export const FONTS = {
  regular: () => path.join(fontDir(), "plex-sans/fonts/complete/woff/IBMPlexSans-Regular.woff"),
  bold: () => path.join(fontDir(), "plex-sans/fonts/complete/woff/IBMPlexSans-SemiBold.woff"),
  mono: () => path.join(fontDir(), "plex-mono/fonts/complete/woff/IBMPlexMono-Regular.woff"),
};

const g = globalThis as unknown as { __loopwrightPdfFonts?: Record<keyof typeof FONTS, Buffer> };
/** The three faces as sfnt bytes, unpacked once per process (woff-to-sfnt.ts). */
function fontBytes(): Record<keyof typeof FONTS, Buffer> {
  g.__loopwrightPdfFonts ??= {
    regular: woffToSfnt(fs.readFileSync(FONTS.regular())), bold: woffToSfnt(fs.readFileSync(FONTS.bold())), mono: woffToSfnt(fs.readFileSync(FONTS.mono())),
  };
  return g.__loopwrightPdfFonts;
}

export function registerFonts(doc: Doc): void {
  const f = fontBytes();
  doc.registerFont("Plex", f.regular);
  doc.registerFont("Plex-Bold", f.bold);
  doc.registerFont("Plex-Mono", f.mono);
  doc.font("Plex");
}

/** Text as written to the page (one place to adapt characters, should a font lack one). */
export const t = (s: string) => s;

export const contentWidth = (doc: Doc) => doc.page.width - 2 * PAGE.margin;
export const bottom = (doc: Doc) => doc.page.height - PAGE.margin - PAGE.footer;

/** Start a new page when fewer than `need` points are left on this one. */
export function ensureSpace(doc: Doc, need: number): void {
  if (doc.y + need > bottom(doc)) doc.addPage();
}
