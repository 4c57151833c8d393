import { TEST_ORIGIN } from "./call";
import { CLIENT_ADDRESS_HEADER } from "@/lib/http/client-address";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** A GET to a route handler, keeping the Response (bytes and headers), as callRoute keeps only text. */
export async function getRaw(handler: unknown, path: string, cookie: string | null, params: Record<string, string>): Promise<Response> {
  const headers = new Headers({ [CLIENT_ADDRESS_HEADER]: "10.9.9.9" });
  if (cookie) headers.set("cookie", cookie);
  return (handler as Handler)(new Request(`${TEST_ORIGIN}${path}`, { headers }), { params: Promise.resolve(params) });
}
