const styles: Record<string, string> = {
  draft: "bg-paper-dark text-ink-soft",
  "in-review": "bg-warn/10 text-warn",
  approved: "bg-ok/10 text-ok",
  issued: "bg-copper-100 text-copper-700",
};

const labels: Record<string, string> = { draft: "Draft", "in-review": "In review", approved: "Approved", issued: "Issued" };

export function StatusBadge({ status }: { status: string }) {
  return (
    <span className={`rounded-full px-2 py-0.5 text-xs font-medium ${styles[status] ?? styles.draft}`}>{labels[status] ?? status}</span>
  );
}
