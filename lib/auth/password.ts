import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from "node:crypto";

// Memory-hard password hashing with node:crypto scrypt (RFC 7914). N = 2^15, r = 8, p = 1
// follows the OWASP Password Storage Cheat Sheet's scrypt minimum; the parameters are
// stored in the hash so they can be raised later without breaking old hashes.
const N = 2 ** 15, R = 8, P = 1, KEYLEN = 32;

function derive(password: string, salt: Buffer, opts: ScryptOptions, keylen: number): Promise<Buffer> {
  return new Promise((resolve, reject) =>
    scrypt(password.normalize("NFKC"), salt, keylen, { ...opts, maxmem: 128 * opts.N! * opts.r! * 2 }, (err, key) =>
      err ? reject(err) : resolve(key)));
}

export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(16);
  const key = await derive(password, salt, { N, r: R, p: P }, KEYLEN);
  return `scrypt$${N}$${R}$${P}$${salt.toString("base64")}$${key.toString("base64")}`;
}

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  const [scheme, n, r, p, salt, key] = hash.split("$");
  if (scheme !== "scrypt" || !n || !r || !p || !salt || !key) return false;
  const expected = Buffer.from(key, "base64");
  const actual = await derive(password, Buffer.from(salt, "base64"), { N: Number(n), r: Number(r), p: Number(p) }, expected.length);
  return timingSafeEqual(expected, actual);
}
