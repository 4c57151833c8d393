// svg-to-pdfkit ships no types: the one call the handover report makes.
declare module "svg-to-pdfkit" {
  export default function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x: number, y: number, options?: {
    width?: number; height?: number; preserveAspectRatio?: string;
    fontCallback?: (family: string, bold: boolean, italic: boolean) => string;
  }): void;
}
