/**
 * Pick A and B from the project's drafts and revisions. A plain GET form: the choice
 * lands in the address (?a=…&b=…), so it can be shared, and it works before scripts load.
 */
import type { DesignGroup } from "@/lib/compare/options";
import { buttonClass } from "@/components/ui/button";

function Choice({ name, groups, value }: { name: "a" | "b"; groups: DesignGroup[]; value: string | null }) {
  const known = groups.some((g) => g.options.some((o) => o.ref === value));
  return (
    <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
      <span className="font-medium">{name.toUpperCase()}</span>
      <select name={name} defaultValue={value ?? ""} required className="min-w-0 rounded-md border border-ink/15 bg-white px-2 py-1.5" data-testid={`pick-${name}`}>
        <option value="" disabled>Choose a design…</option>
        {value && !known && <option value={value}>{value}</option>}
        {groups.map((g) => (
          <optgroup key={g.label} label={g.label}>
            {g.options.map((o) => <option key={o.ref} value={o.ref}>{o.label}</option>)}
          </optgroup>
        ))}
      </select>
    </label>
  );
}

export function ComparePicker({ action, groups, a, b }: { action: string; groups: DesignGroup[]; a: string | null; b: string | null }) {
  return (
    <form method="get" action={action} className="flex flex-col gap-3 sm:flex-row sm:items-end" data-testid="compare-picker">
      <Choice name="a" groups={groups} value={a} />
      <Choice name="b" groups={groups} value={b} />
      <button type="submit" className={buttonClass("primary", "shrink-0")}>Compare</button>
    </form>
  );
}
