import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { config } from "@/lib/config";

// The object store (S3 API; locally the s3rver fake that npm start / npm test run). The
// bucket is private: the browser reaches an object only through a short-lived presigned
// URL this server signs after checking the caller's role, or through our own routes.
// Checksums only when required: s3rver would otherwise keep the SDK's chunked checksum
// framing inside the object (shared/design/setup-notes.md).

const g = globalThis as unknown as { __loopwrightS3?: S3Client };

export function s3(): S3Client {
  g.__loopwrightS3 ??= new S3Client({
    endpoint: config.s3Endpoint, region: config.s3Region, forcePathStyle: true,
    credentials: { accessKeyId: config.s3AccessKeyId, secretAccessKey: config.s3SecretAccessKey },
    requestChecksumCalculation: "WHEN_REQUIRED", responseChecksumValidation: "WHEN_REQUIRED",
  });
  return g.__loopwrightS3;
}

const Bucket = () => config.s3Bucket;
export const PRESIGN_SECONDS = 15 * 60;

/** A URL the browser PUTs the file to, valid for PRESIGN_SECONDS, for exactly this type and length. */
export function presignPut(key: string, contentType: string, size: number): Promise<string> {
  return getSignedUrl(s3(), new PutObjectCommand({ Bucket: Bucket(), Key: key, ContentType: contentType, ContentLength: size }), { expiresIn: PRESIGN_SECONDS });
}

export function presignGet(key: string, fileName: string): Promise<string> {
  const disposition = `inline; filename="${fileName.replace(/[^\w.\- ]/g, "_")}"`;
  return getSignedUrl(s3(), new GetObjectCommand({ Bucket: Bucket(), Key: key, ResponseContentDisposition: disposition }), { expiresIn: PRESIGN_SECONDS });
}

/** The stored object's size, or null when nothing is there. */
export async function objectSize(key: string): Promise<number | null> {
  try {
    const h = await s3().send(new HeadObjectCommand({ Bucket: Bucket(), Key: key }));
    return h.ContentLength ?? null;
  } catch (e) {
    const status = (e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (e as Error).name === "NotFound") return null;
    throw e;
  }
}

/** The object's bytes (or its first `firstBytes`). */
export async function readObject(key: string, firstBytes?: number): Promise<Uint8Array> {
  const r = await s3().send(new GetObjectCommand({ Bucket: Bucket(), Key: key, Range: firstBytes ? `bytes=0-${firstBytes - 1}` : undefined }));
  return r.Body ? await r.Body.transformToByteArray() : new Uint8Array();
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: Bucket(), Key: key, Body: body, ContentType: contentType }));
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: Bucket(), Key: key }));
}
