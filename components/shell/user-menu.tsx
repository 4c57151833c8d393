import Link from "next/link";
import { SignOutButton } from "@/components/auth/sign-out-button";

// Header corner: who is signed in (links to the account page) and a sign-out button.
export function UserMenu({ name, email }: { name: string; email: string }) {
  return (
    <div className="flex items-center gap-3 text-sm">
      <Link href="/account" className="flex items-center gap-2 rounded px-2 py-1 hover:bg-paper-dark" title={email} data-testid="user-menu">
        <span aria-hidden className="flex h-7 w-7 items-center justify-center rounded-full bg-copper-100 text-xs font-semibold text-copper-700">
          {name.split(/\s+/).map((w) => w[0]).slice(0, 2).join("").toUpperCase()}
        </span>
        <span className="hidden max-w-[12rem] truncate text-ink-soft sm:inline">{name}</span>
      </Link>
      <SignOutButton className="rounded px-2 py-1 text-ink-soft hover:bg-paper-dark hover:text-ink" />
    </div>
  );
}
