import Link from "next/link";
import { Logo } from "@/components/brand/logo";

// The calm frame around every signed-out page: logo, a title, one short line, the form.
export function AuthCard({ title, lead, children, footer }: { title: string; lead?: React.ReactNode; children: React.ReactNode; footer?: React.ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center px-4 py-10 sm:justify-center">
      <Link href="/" className="mb-6 flex items-center gap-2 font-semibold text-ink">
        <Logo className="h-7 w-7" /> Loopwright
      </Link>
      <div className="w-full max-w-sm rounded-lg border border-ink/10 bg-white p-6 shadow-sm">
        <h1 className="text-xl font-semibold">{title}</h1>
        {lead && <p className="mt-1 text-sm text-ink-soft">{lead}</p>}
        <div className="mt-5">{children}</div>
      </div>
      {footer && <div className="mt-4 max-w-sm text-center text-sm text-ink-soft">{footer}</div>}
    </main>
  );
}
