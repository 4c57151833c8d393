import { signInRedirect } from "@/lib/auth/page-guard";
import { AppHeader } from "@/components/shell/app-header";
import { UserMenu } from "@/components/shell/user-menu";
import { getCurrentUser } from "@/lib/auth/session";

// Everything under (app) needs a signed-in person; project-level roles are checked by
// each page and action through lib/auth/authorize.ts.
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await getCurrentUser();
  if (!user) return signInRedirect();
  return (
    <div className="flex min-h-screen flex-col">
      <AppHeader right={<UserMenu name={user.name} email={user.email} />} />
      <div className="flex-1">{children}</div>
    </div>
  );
}
