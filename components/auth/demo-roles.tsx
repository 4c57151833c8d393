import { demoSignInAction } from "@/components/auth/actions";

// Landing-page row (development / demo servers only): one click signs in as the seeded
// person for a role. Each button is its own form posting to a server action.
const roles = [
  { role: "owner", blurb: "runs the project and its team" },
  { role: "designer", blurb: "draws and sizes" },
  { role: "reviewer", blurb: "checks and approves" },
  { role: "installer", blurb: "builds from the issued revision" },
  { role: "trainee", blurb: "learns with practice variants" },
] as const;

export function DemoRoles() {
  return (
    <section className="mt-10" aria-labelledby="demo-heading">
      <h2 id="demo-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-faint">Try a demo role</h2>
      <p className="mt-1 text-sm text-ink-soft">Sign in as one of the invented Fernbank Heating Co-op team, in one click.</p>
      <div className="mt-3 flex flex-wrap gap-2">
        {roles.map((r) => (
          <form key={r.role} action={demoSignInAction}>
            <input type="hidden" name="role" value={r.role} />
            <button type="submit" data-testid={`demo-${r.role}`}
              className="rounded-md border border-copper-300 bg-copper-50 px-3 py-2 text-left text-sm transition hover:border-copper-500 hover:bg-copper-100">
              <span className="block font-medium capitalize text-copper-700">{r.role}</span>
              <span className="block text-xs text-ink-soft">{r.blurb}</span>
            </button>
          </form>
        ))}
      </div>
    </section>
  );
}
