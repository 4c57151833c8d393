import Link from "next/link";
import { Logo } from "@/components/brand/logo";

const nav = [
  { href: "/projects", label: "Projects" },
];

export const HEADER_SLOT = "app-header-slot";

export function AppHeader({ right }: { right?: React.ReactNode }) {
  return (
    <header className="sticky top-0 z-20 border-b border-ink/10 bg-paper/95 backdrop-blur">
      <div className="mx-auto flex h-14 max-w-7xl items-center gap-4 px-4">
        <Link href="/" className="flex items-center gap-2 font-semibold">
          <Logo className="h-6 w-6" /> Loopwright
        </Link>
        <nav className="flex gap-1 text-sm">
          {nav.map((n) => (
            <Link key={n.href} href={n.href} className="rounded px-2 py-1 text-ink-soft hover:bg-paper-dark hover:text-ink">{n.label}</Link>
          ))}
        </nav>
        {/* pages put live bits here (the board: who else is looking), through a portal */}
        <div id={HEADER_SLOT} className="ml-auto flex items-center gap-2" />
        <div>{right}</div>
      </div>
    </header>
  );
}
