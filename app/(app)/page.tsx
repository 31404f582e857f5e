import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { RoleHome } from "@/components/home/role-home";

export const metadata: Metadata = { title: "Home" };
export const dynamic = "force-dynamic";

export default async function HomePage() {
  const user = await requirePageUser();
  return <RoleHome user={user} />;
}
