// better-auth's admin plugin needs its own role map; only Tearline's admin may manage accounts.
import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements } from "better-auth/plugins/admin/access";

export const ac = createAccessControl(defaultStatements);

export const authRoles = {
  admin: adminAc,
  inspector: ac.newRole({ user: [], session: [] }),
  analyst: ac.newRole({ user: [], session: [] }),
  engineer: ac.newRole({ user: [], session: [] }),
  manager: ac.newRole({ user: [], session: [] }),
};
