// Who may do what, as data. Server code checks these; the client uses them only to hide buttons.
export const ROLES = ["inspector", "analyst", "engineer", "manager", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  inspector: "Shop inspector",
  analyst: "Teardown analyst",
  engineer: "Reliability engineer",
  manager: "Manager",
  admin: "Administrator",
};

const everyone: Role[] = [...ROLES];

export const PERMISSIONS = {
  "case:read": everyone,
  // Inspectors read the cases of their own shop and those they filed; the rest read all.
  "case:read-all": ["analyst", "engineer", "manager", "admin"],
  "case:create": ["inspector", "analyst", "admin"],
  "case:edit-field": ["inspector", "analyst", "admin"],
  "case:receive": ["analyst", "admin"],
  "case:edit-teardown": ["analyst", "admin"],
  "case:propose": ["analyst", "admin"],
  "case:sign": ["engineer", "admin"],
  "case:return": ["engineer", "admin"],
  "case:reopen": ["engineer", "admin"],
  "case:link": ["engineer", "admin"],
  "case:export": ["analyst", "engineer", "manager", "admin"],
  "photo:upload": ["inspector", "analyst", "admin"],
  "photo:delete": ["inspector", "analyst", "admin"],
  "tallies:read": everyone,
  "tallies:read-all": ["analyst", "engineer", "manager", "admin"],
  "fleet:upload": ["engineer", "manager", "admin"],
  "digest:send": ["admin"],
  "admin:users": ["admin"],
  "admin:sites": ["admin"],
  "admin:codes": ["admin"],
  "admin:outbox": ["admin"],
  "admin:audit": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

export function can(role: string | null | undefined, permission: Permission): boolean {
  if (!isRole(role)) return false;
  if (role === "admin") return true;
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
