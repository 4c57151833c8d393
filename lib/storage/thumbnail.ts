import "server-only";
import sharp from "sharp";

/** A small WebP for lists: turned upright from its EXIF orientation, fitted inside 320 px. */
export async function thumbnailOf(image: Uint8Array): Promise<Uint8Array> {
  const out = await sharp(image, { limitInputPixels: 50_000_000 }).rotate().resize(320, 320, { fit: "inside", withoutEnlargement: true }).webp({ quality: 72 }).toBuffer();
  return new Uint8Array(out);
}
