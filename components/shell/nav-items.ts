import { can, type Permission, type Role } from "@/lib/auth/permissions";

export type NavItem = { href: string; label: string; icon: string; permission?: Permission; group?: "admin" };

export const NAV_ITEMS: NavItem[] = [
  { href: "/", label: "Home", icon: "M3 11l9-7 9 7v9a1 1 0 01-1 1h-5v-6H9v6H4a1 1 0 01-1-1z" },
  { href: "/cases", label: "Cases", icon: "M4 5h16M4 12h16M4 19h10" },
  { href: "/cases/new", label: "New removal", icon: "M12 5v14M5 12h14", permission: "case:create" },
  { href: "/search", label: "Search", icon: "M11 18a7 7 0 100-14 7 7 0 000 14zM20 20l-4-4" },
  { href: "/tallies", label: "Tallies", icon: "M5 20V10M12 20V4M19 20v-7", permission: "tallies:read" },
  { href: "/reference", label: "Damage codes", icon: "M5 4h11l3 3v13H5zM9 9h6M9 13h6M9 17h4" },
  {
    href: "/admin/users",
    label: "People",
    icon: "M16 19v-1a4 4 0 00-8 0v1M12 11a3 3 0 100-6 3 3 0 000 6z",
    permission: "admin:users",
    group: "admin",
  },
  { href: "/admin/sites", label: "Sites & limits", icon: "M4 20h16M6 20V9l6-4 6 4v11", permission: "admin:sites", group: "admin" },
  { href: "/admin/codes", label: "Code lists", icon: "M7 7h10M7 12h10M7 17h6", permission: "admin:codes", group: "admin" },
  { href: "/admin/outbox", label: "Outbox", icon: "M4 6h16v12H4zM4 7l8 6 8-6", permission: "admin:outbox", group: "admin" },
  { href: "/admin/audit", label: "Audit log", icon: "M9 4h6v3H9zM6 6h12v14H6zM9 11h6M9 15h6", permission: "admin:audit", group: "admin" },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((i) => !i.permission || can(role, i.permission));
}
