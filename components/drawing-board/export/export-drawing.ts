"use client";
/**
 * Turning the drawing sheet into files: SVG text, a PNG at twice the size,
 * or the print dialog. The sheet is rendered once into a detached element and
 * read back as markup; nothing on screen changes.
 */
import type { ReactElement } from "react";
import { flushSync } from "react-dom";
import { createRoot } from "react-dom/client";

export function sheetMarkup(sheet: ReactElement): string {
  const host = document.createElement("div");
  const root = createRoot(host);
  flushSync(() => root.render(sheet));
  const svg = host.innerHTML;
  root.unmount();
  return `<?xml version="1.0" encoding="UTF-8"?>\n${svg}`;
}

function save(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function downloadSvg(markup: string, fileName: string) {
  save(new Blob([markup], { type: "image/svg+xml" }), fileName);
}

export async function downloadPng(markup: string, fileName: string, scale = 2): Promise<void> {
  const url = URL.createObjectURL(new Blob([markup], { type: "image/svg+xml" }));
  try {
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error("The drawing could not be turned into a picture."));
      img.src = url;
    });
    const canvas = document.createElement("canvas");
    canvas.width = Math.ceil(img.width * scale);
    canvas.height = Math.ceil(img.height * scale);
    const ctx = canvas.getContext("2d");
    if (!ctx) throw new Error("This browser cannot draw the picture.");
    ctx.fillStyle = "#ffffff";
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    const png = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
    if (!png) throw new Error("The picture could not be made.");
    save(png, fileName);
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** The browser's print dialog with the sheet alone on the page, fitted to it. */
export function printSheet(markup: string, title: string) {
  const frame = document.createElement("iframe");
  frame.style.cssText = "position:fixed;right:0;bottom:0;width:0;height:0;border:0";
  frame.title = title;
  frame.srcdoc = `<!doctype html><title>${title.replace(/</g, "&lt;")}</title><style>@page{size:landscape;margin:10mm}body{margin:0}svg{width:100%;height:auto}</style>${markup.replace(/^<\?xml[^>]*>\s*/, "")}`;
  frame.onload = () => {
    frame.contentWindow?.focus();
    frame.contentWindow?.print();
    setTimeout(() => frame.remove(), 60_000);
  };
  document.body.append(frame);
}

/** "Orchard End — Bypass only — Rev 1" → "orchard-end-bypass-only-rev-1". */
export const fileStem = (...words: string[]) =>
  words.join(" ").toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 80) || "drawing";
