import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

// Text of each page of a PDF as a reader would extract it (Mozilla's pdf.js), to check what
// a report says without trusting the code that wrote it.

export async function pdfPages(bytes: Uint8Array): Promise<string[]> {
  const pdf = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= pdf.numPages; i++) {
    const content = await (await pdf.getPage(i)).getTextContent();
    pages.push(content.items.map((it) => ("str" in it ? it.str + (it.hasEOL ? "\n" : " ") : "")).join(""));
  }
  await pdf.destroy();
  return pages;
}

/** Whitespace-free, for finding words whatever line breaks the layout made. */
export const squeeze = (s: string) => s.replace(/\s+/g, "");
