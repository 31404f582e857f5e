// What the audit log records, in the words of the audit page.
export const AUDIT_KINDS = {
  "sign-in": "Signed in",
  "sign-in-failed": "Sign-in refused",
  "sign-out": "Signed out",
  "account-locked": "Account locked",
  "account-unlocked": "Account unlocked",
  invitation: "Invitation sent",
  "role-change": "Role changed",
  "site-change": "Home site changed",
  suspension: "Suspended",
  restoration: "Restored",
  "site-policy": "Site policy edited",
  "code-list": "Code list edited",
  export: "Export",
} as const;

export type AuditKind = keyof typeof AUDIT_KINDS;
export const AUDIT_KIND_VALUES = Object.keys(AUDIT_KINDS) as [AuditKind, ...AuditKind[]];
