import "server-only";
import { randomUUID } from "node:crypto";
import { AuthError, requireSchematicAccess, type SchematicAccess } from "@/lib/auth/authorize";
import { withRequestCookies } from "@/lib/auth/request-context";
import { db } from "@/lib/db";
import { liveListener, type LiveEvent } from "./listener";
import { arrive, leave, presentOn, stillHere, type Present } from "./presence";

// One board's live stream as Server-Sent Events (text/event-stream, same origin, so a
// `connect-src 'self'` policy allows it). Events: hello, presence, draft, revision, thread.
// The browser's EventSource reconnects by itself after `retry` ms when the connection
// drops, and the board refetches what it shows on reconnecting; so when this instance
// loses its LISTEN connection (and would miss announcements) the stream simply ends. A heartbeat keeps proxies from closing an idle stream, refreshes this viewer's
// presence, and checks they may still read the board (signed out or removed → closed).

export const RETRY_MS = 2000;
const HEARTBEAT_MS = Number(process.env.LIVE_HEARTBEAT_MS ?? 20_000);

/** What a viewer is sent of an announcement; null when it is not for them (installers: issued revisions only). */
export function eventFor(access: Pick<SchematicAccess, "issuedOnly">, e: LiveEvent): { event: string; data: Record<string, unknown> } | null {
  if (access.issuedOnly && (e.t === "draft" || ((e.t === "revision" || e.t === "thread") && e.st !== "issued"))) return null;
  switch (e.t) {
    case "draft": return { event: "draft", data: { lockVersion: e.v, by: e.by ?? null } };
    case "revision": return { event: "revision", data: { revisionId: e.r, status: e.st } };
    case "thread": return { event: "thread", data: { threadId: e.th, revisionId: e.r } };
    default: return null;
  }
}

const frame = (event: string, data: unknown) => `event: ${event}\ndata: ${JSON.stringify(data)}\n\n`;

export function liveResponse(req: Request, access: SchematicAccess): Response {
  const encoder = new TextEncoder();
  const connectionId = randomUUID();
  const schematicId = access.schematic.id;
  const cookie = req.headers.get("cookie");
  let stop: () => Promise<void> = async () => {};

  const body = new ReadableStream<Uint8Array>({
    async start(controller) {
      let closed = false;
      let unsubscribe = () => {};
      let lastPresence = "";
      let presenceTimer: ReturnType<typeof setTimeout> | undefined;
      const write = (text: string) => {
        if (closed) return;
        try { controller.enqueue(encoder.encode(text)); } catch { void stop(); }
      };
      const sendPresence = async () => {
        const people: Present[] = await presentOn(schematicId).catch(() => []);
        const json = JSON.stringify(people);
        if (json !== lastPresence) write(frame("presence", { people }));
        lastPresence = json;
      };
      const heartbeat = setInterval(async () => {
        write(": ping\n\n");
        await stillHere(connectionId).catch(() => {});
        const allowed = await withRequestCookies(cookie, () => requireSchematicAccess(schematicId, "read")).then(() => true,
          (e) => !(e instanceof AuthError));
        if (!allowed) return void stop();
        await sendPresence();
      }, HEARTBEAT_MS);
      stop = async () => {
        if (closed) return;
        closed = true;
        clearInterval(heartbeat);
        clearTimeout(presenceTimer);
        unsubscribe();
        try { controller.close(); } catch { /* already closed by the client */ }
        await leave(connectionId).catch(() => {});
      };
      req.signal.addEventListener("abort", () => void stop());

      write(`retry: ${RETRY_MS}\n\n`);
      try {
        unsubscribe = await liveListener().subscribe(schematicId, (e) => {
          if (e.t === "presence") {
            // several arrivals at once make one answer
            clearTimeout(presenceTimer);
            presenceTimer = setTimeout(() => void sendPresence(), 30);
            return;
          }
          if (e.t === "resync") return void stop();
          const out = eventFor(access, e);
          if (out) write(frame(out.event, out.data));
        });
        await arrive(connectionId, schematicId, access.user.id);
      } catch (err) {
        console.error("[loopwright] live stream could not start", err);
        return void stop();
      }
      // the draft's lock version: a board coming back after a drop sees whether it missed a save
      const draft = access.issuedOnly ? null : await db()("schematics").where({ id: schematicId }).first("lock_version").catch(() => null);
      write(frame("hello", { connectionId, you: access.user.id, lockVersion: draft?.lock_version ?? null }));
      await sendPresence();
    },
    cancel() {
      return stop();
    },
  });

  return new Response(body, {
    headers: {
      "content-type": "text/event-stream; charset=utf-8",
      // no-transform: the server's compression must not buffer the stream
      "cache-control": "no-cache, no-transform",
      "x-accel-buffering": "no",
    },
  });
}
