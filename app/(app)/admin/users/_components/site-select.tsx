import { Select } from "@/components/ui/field";
import { siteOptions, type SiteChoice } from "./types";

/** A home-site picker; "no home site" means the person works across all sites. */
export function SiteSelect({
  sites,
  value,
  ...props
}: { sites: SiteChoice[]; value: string | null } & Omit<React.ComponentProps<"select">, "value">) {
  return (
    <Select value={value ?? ""} {...props}>
      <option value="">No home site (all sites)</option>
      {siteOptions(sites, value).map((s) => (
        <option key={s.id} value={s.id}>
          {s.code} · {s.name}
          {s.active ? "" : " (inactive)"}
        </option>
      ))}
    </Select>
  );
}
