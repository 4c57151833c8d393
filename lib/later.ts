import "server-only";

// Work done after the answer is sent, so the answer takes the same time whatever the work
// is (account e-mails: the form must not tell by its speed whether an address has an
// account). Runs in this process; a failure is logged, never shown. If the process stops
// first the work is lost, and the person asks again (a reset or sign-up link).
const pending = new Set<Promise<void>>();

export function later(label: string, job: () => Promise<void>): void {
  const p = Promise.resolve()
    .then(job)
    .catch((err) => console.error(`[loopwright] ${label} failed`, err))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Waits until every job started so far has finished (tests, and a graceful stop). */
export async function laterSettled(): Promise<void> {
  while (pending.size > 0) await Promise.all([...pending]);
}
