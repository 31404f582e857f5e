import { Select } from "@/components/ui/field";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";

export function RoleSelect(props: React.ComponentProps<"select">) {
  return (
    <Select {...props}>
      {ROLES.map((r) => (
        <option key={r} value={r}>
          {ROLE_LABELS[r]}
        </option>
      ))}
    </Select>
  );
}
