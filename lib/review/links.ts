/** Paths to the board at a thread or a revision (client-safe; e-mails put the app's address in front). */
export function boardPath(projectId: string, schematicId: string, at: { thread?: string; rev?: string } = {}): string {
  const q = new URLSearchParams();
  if (at.rev) q.set("rev", at.rev);
  if (at.thread) q.set("thread", at.thread);
  const s = q.toString();
  return `/projects/${projectId}/schematics/${schematicId}${s ? `?${s}` : ""}`;
}
