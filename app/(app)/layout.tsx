import { AppShell } from "@/components/shell/app-shell";
import { requirePageUser } from "@/lib/auth/session";

// The layout shows the shell; each page still checks the role itself.
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser();
  return <AppShell user={user}>{children}</AppShell>;
}
