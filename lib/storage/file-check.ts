import "server-only";
import { fileTypeFromBuffer } from "file-type";

// What a stored file really is, from its bytes (file-type reads the magic numbers; the name
// and the declared type are the sender's word only), and the size each kind may have.

export const MB = 1024 * 1024;
export const kinds = {
  "image/jpeg": { what: "photo", maxBytes: 15 * MB },
  "image/png": { what: "photo", maxBytes: 15 * MB },
  "image/webp": { what: "photo", maxBytes: 15 * MB },
  "application/pdf": { what: "PDF", maxBytes: 25 * MB },
} as const;
export type AcceptedType = keyof typeof kinds;
export const acceptedTypes = Object.keys(kinds) as AcceptedType[];
export const isAccepted = (t: string): t is AcceptedType => t in kinds;

/** Enough bytes for file-type to recognise every format we accept. */
export const SNIFF_BYTES = 4100;

export const limitsText = "photos (JPEG, PNG, WebP) up to 15 MB and PDF documents up to 25 MB";
const mb = (n: number) => `${(n / MB).toFixed(1)} MB`;

export type FileVerdict = { ok: true; type: AcceptedType } | { ok: false; status: 413 | 415; reason: string };

export async function checkFile(fileName: string, head: Uint8Array, size: number): Promise<FileVerdict> {
  const found = await fileTypeFromBuffer(head);
  if (!found || !isAccepted(found.mime)) {
    const seen = found ? `${found.mime} (.${found.ext})` : "no known file type";
    return { ok: false, status: 415, reason: `"${fileName}" is not a photo or a PDF: its bytes are ${seen}, whatever its name says. Only ${limitsText} are taken.` };
  }
  const max = kinds[found.mime].maxBytes;
  if (size > max) return { ok: false, status: 413, reason: `"${fileName}" is ${mb(size)}; a ${kinds[found.mime].what} may be at most ${mb(max)}.` };
  return { ok: true, type: found.mime };
}
