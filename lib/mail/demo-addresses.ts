// Addresses the caught-mail page (/dev/mail) may show: those under the top-level names kept
// for examples and tests (RFC 2606 §2: .example, .test, .invalid, .localhost; RFC 6761),
// which no real mailbox can have. The demo firm's people are @fernbank.example.
const RESERVED = ["example", "test", "invalid", "localhost"];

export const demoDomainsText = RESERVED.map((d) => `.${d}`).join(", ");

export function isDemoAddress(address: string): boolean {
  const at = address.lastIndexOf("@");
  const tld = at < 0 ? "" : address.slice(at + 1).trim().toLowerCase().split(".").pop() ?? "";
  return RESERVED.includes(tld);
}
