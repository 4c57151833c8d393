import "server-only";
import pg from "pg";
import { config } from "@/lib/config";

// One LISTEN connection per app instance: a dedicated pg client (a pooled one would be
// handed to other queries and lose the LISTEN), fanned out in process to the open live
// streams by schematic. What is announced comes from the database's triggers on channel
// lw_live (db/migrations/…_review_threads.ts), so writes made through any instance reach
// the streams of every instance. When the connection drops, every stream is told (and
// ends: its browser reconnects and refetches); the next subscribe connects again.

export const LIVE_CHANNEL = "lw_live";

/** An announcement: s = schematic id, t = what changed, the rest depends on t. */
export interface LiveEvent {
  s: string;
  /** resync: this instance stopped hearing announcements (its streams end, clients reconnect and refetch) */
  t: "draft" | "revision" | "thread" | "presence" | "resync";
  /** revision id; st its status (revision and thread events) */
  r?: string;
  st?: string;
  /** thread id */
  th?: string;
  /** draft: lock version and who saved it */
  v?: number;
  by?: string | null;
}

type Subscriber = (e: LiveEvent) => void;

class Listener {
  private client: pg.Client | null = null;
  private connecting: Promise<void> | null = null;
  private readonly subs = new Map<string, Set<Subscriber>>();

  async subscribe(schematicId: string, fn: Subscriber): Promise<() => void> {
    const set = this.subs.get(schematicId) ?? new Set();
    set.add(fn);
    this.subs.set(schematicId, set);
    await this.ready();
    return () => {
      set.delete(fn);
      if (set.size === 0) this.subs.delete(schematicId);
    };
  }

  /** Resolves once LISTEN is in place, so nothing written after it is missed. */
  private ready(): Promise<void> {
    if (this.client) return Promise.resolve();
    this.connecting ??= this.connect().finally(() => { this.connecting = null; });
    return this.connecting;
  }

  private async connect(): Promise<void> {
    const client = new pg.Client({ connectionString: config.databaseUrl, keepAlive: true });
    client.on("notification", (n) => this.deliver(n.payload));
    client.on("error", (err) => this.lost(client, err));
    client.on("end", () => this.lost(client, null));
    await client.connect();
    await client.query(`LISTEN ${LIVE_CHANNEL}`);
    this.client = client;
  }

  private deliver(payload: string | undefined) {
    let e: LiveEvent;
    try {
      e = JSON.parse(payload ?? "");
    } catch {
      return;
    }
    for (const fn of this.subs.get(e.s) ?? []) fn(e);
  }

  /**
   * The LISTEN connection is gone: announcements are missed from now on, so every stream
   * is told at once (they end, and their browsers reconnect after `retry` and refetch).
   * The connection is made again by the next subscribe.
   */
  private lost(client: pg.Client, err: Error | null) {
    if (this.client !== client) return;
    this.client = null;
    if (err) console.error("[loopwright] live listener lost its database connection", err.message);
    client.end().catch(() => {});
    for (const [s, set] of this.subs) for (const fn of [...set]) fn({ s, t: "resync" });
  }

  /** For tests: drop the connection as a network fault would. */
  async dropForTest(): Promise<void> {
    await this.client?.end();
  }

  /** Stop listening for good (a test's clean-up). */
  async close(): Promise<void> {
    this.subs.clear();
    const c = this.client;
    this.client = null;
    await c?.end().catch(() => {});
  }
}

const g = globalThis as unknown as { __loopwrightLive?: Listener };
export function liveListener(): Listener {
  g.__loopwrightLive ??= new Listener();
  return g.__loopwrightLive;
}
