import Link from "next/link";
import { Logo } from "@/components/brand/logo";
import { buttonClass } from "@/components/ui/button";
import { DemoRoles } from "@/components/auth/demo-roles";
import { config } from "@/lib/config";
import { getCurrentUser } from "@/lib/auth/session";

const steps = [
  { title: "Draw the plant room", body: "Heat pump or boiler, pumps, zone valves, bypass, buffer, cylinder and emitters on one canvas, piped port to port." },
  { title: "Size it", body: "Design flows, pipe velocities and pressure drops, the index circuit and pump head, balancing Kv, bypass setting, expansion vessel and system volume." },
  { title: "Show the working", body: "Every number opens to its formula, inputs and published source, so a reviewer can check it and a trainee can learn from it." },
  { title: "Review, issue, build", body: "Comments pinned to parts, approval, an issued revision for site, and a phone-first site sheet for pressure tests and commissioning." },
];

export const dynamic = "force-dynamic";

export default async function LandingPage() {
  const user = await getCurrentUser();
  return (
    <main className="mx-auto max-w-5xl px-5 py-10 sm:py-16">
      <header className="flex items-center gap-3">
        <Logo className="h-9 w-9" />
        <span className="text-xl font-semibold tracking-tight">Loopwright</span>
        <nav className="ml-auto flex gap-2">
          {user ? <Link href="/projects" className={buttonClass("secondary")}>Projects</Link>
            : <Link href="/sign-in" className={buttonClass("secondary")}>Sign in</Link>}
        </nav>
      </header>

      <section className="mt-12 max-w-3xl">
        <h1 className="text-3xl font-semibold leading-tight sm:text-5xl">
          Wet heating plant rooms, <span className="text-copper-500">drawn, checked and sized</span> — numbers you can trace.
        </h1>
        <p className="mt-5 text-lg text-ink-soft">
          Loopwright is for heating engineers and heat-pump installers, the senior engineers who review their designs, and the
          trainees who learn from them: from schematic and sizing to pressure test, commissioning and handover.
        </p>
        <div className="mt-8 flex flex-wrap gap-3">
          <Link href="/projects" className={buttonClass("primary", "px-5 py-3 text-base")}>Open your projects</Link>
          {!user && <Link href="/sign-up" className={buttonClass("secondary", "px-5 py-3 text-base")}>Create an account</Link>}
        </div>
        {config.demoSignIn && <DemoRoles />}
      </section>

      <section className="mt-16 grid gap-4 sm:grid-cols-2">
        {steps.map((s, i) => (
          <div key={s.title} className="rounded-lg border border-ink/10 bg-white p-5 shadow-sm">
            <div className="num text-sm text-copper-600">0{i + 1}</div>
            <h2 className="mt-1 font-semibold">{s.title}</h2>
            <p className="mt-2 text-sm text-ink-soft">{s.body}</p>
          </div>
        ))}
      </section>

      <aside className="mt-12 rounded-lg border border-warn/30 bg-warn/5 p-4 text-sm text-ink-soft">
        <strong className="text-ink">Safety.</strong> Results are design aids to be checked by a competent person. Pressure,
        stored hot water, electricity and refrigerant can hurt people: follow local codes, manufacturers&apos; instructions and
        licensed practice.
      </aside>
    </main>
  );
}
