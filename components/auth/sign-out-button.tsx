import { signOutAction } from "@/components/auth/actions";

// A form, not a link: signing out changes state, so it is a POST (server action).
export function SignOutButton({ label = "Sign out", className, next }: { label?: string; className?: string; next?: string }) {
  return (
    <form action={signOutAction}>
      {next && <input type="hidden" name="next" value={next} />}
      <button type="submit" className={className ?? "text-copper-600 hover:underline"}>{label}</button>
    </form>
  );
}
