import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

// Two (or more) `next start` processes on the already-built .next (scripts/test.sh builds
// first), one database. Ports come from TWO_PORT_A/B, else from this worktree's E2E_PORT, so
// test runs in neighbouring checkouts do not collide.

const root = process.cwd();
const base = Number(process.env.E2E_PORT ?? 3100) + 1101;
export const ports = [Number(process.env.TWO_PORT_A ?? base), Number(process.env.TWO_PORT_B ?? base + 1)] as const;
export const url = (i: 0 | 1, p: string) => `http://127.0.0.1:${ports[i]}${p}`;
const servers: ChildProcess[] = [];

async function waitUp(port: number, child: ChildProcess, log: () => string) {
  const until = Date.now() + 45_000;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`next start on ${port} exited: ${log()}`);
    try { if ((await fetch(`http://127.0.0.1:${port}/sign-in`)).ok) return; } catch { /* not yet */ }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`next start on ${port} did not answer within 45 s: ${log()}`);
}

export async function startInstances(): Promise<void> {
  if (!fs.existsSync(path.join(root, ".next/BUILD_ID"))) throw new Error("No production build in .next: run `npx next build` (npm test does it first).");
  await Promise.all(ports.map((port) => {
    let out = "";
    const child = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-p", String(port), "-H", "127.0.0.1"], {
      cwd: root, env: { ...process.env, PORT: String(port), NEXT_TELEMETRY_DISABLED: "1" }, stdio: ["ignore", "pipe", "pipe"], detached: true,
    });
    child.stdout!.on("data", (d) => { out += d; });
    child.stderr!.on("data", (d) => { out += d; });
    servers.push(child);
    return waitUp(port, child, () => out.slice(-2000));
  }));
}

export function stopInstances(): void {
  // each server was started in its own process group: stop the group (next start forks)
  for (const s of servers) if (s.pid && s.exitCode === null) { try { process.kill(-s.pid, "SIGTERM"); } catch { /* gone */ } }
}
