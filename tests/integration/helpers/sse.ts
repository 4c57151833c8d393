// Reads a text/event-stream response as events, for the live-board tests.
export type SseEvent = { event: string; data: any; at: number };

export class SseReader {
  readonly events: SseEvent[] = [];
  private waiters: (() => void)[] = [];
  private buffer = "";
  private reader: ReadableStreamDefaultReader<Uint8Array>;
  closed = false;

  constructor(res: Response) {
    if (!res.body) throw new Error("no stream body");
    this.reader = res.body.getReader();
    void this.pump();
  }

  private async pump() {
    const decoder = new TextDecoder();
    try {
      for (;;) {
        const { done, value } = await this.reader.read();
        if (done) break;
        this.buffer += decoder.decode(value, { stream: true });
        let cut: number;
        while ((cut = this.buffer.indexOf("\n\n")) !== -1) {
          const block = this.buffer.slice(0, cut);
          this.buffer = this.buffer.slice(cut + 2);
          const event = /^event: (.*)$/m.exec(block)?.[1];
          const data = /^data: (.*)$/m.exec(block)?.[1];
          if (event) this.events.push({ event, data: data ? JSON.parse(data) : null, at: performance.now() });
          for (const w of this.waiters.splice(0)) w();
        }
      }
    } catch { /* cancelled */ }
    this.closed = true;
    for (const w of this.waiters.splice(0)) w();
  }

  /** The first event (from `from` on) that matches, waiting up to timeoutMs. */
  async next(match: (e: SseEvent) => boolean, timeoutMs = 5000, from = 0): Promise<SseEvent> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const hit = this.events.slice(from).find(match);
      if (hit) return hit;
      if (this.closed) throw new Error(`stream closed; events: ${this.events.map((e) => e.event).join(", ")}`);
      const left = until - Date.now();
      if (left <= 0) throw new Error(`no matching event within ${timeoutMs} ms; got: ${JSON.stringify(this.events.slice(from))}`);
      await new Promise<void>((r) => { this.waiters.push(r); setTimeout(r, left); });
    }
  }

  async close() {
    await this.reader.cancel().catch(() => {});
  }
}
