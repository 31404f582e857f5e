"use client";
import { useState } from "react";
import { EmptyState } from "@/components/ui/card";
import { Input, Select } from "@/components/ui/field";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";
import { PersonRow } from "./person-row";
import { PEOPLE_COLUMNS, type Person, type SiteChoice } from "./types";

/** Everyone with an account, narrowed by a name or e-mail and by role. */
export function PeopleList({ people, sites, meId }: { people: Person[]; sites: SiteChoice[]; meId: string }) {
  const [text, setText] = useState("");
  const [role, setRole] = useState("");
  const needle = text.trim().toLowerCase();
  const shown = people.filter(
    (p) =>
      (!role || p.role === role || (role === "suspended" && p.banned)) &&
      (!needle || `${p.name} ${p.email}`.toLowerCase().includes(needle)),
  );
  return (
    <>
      <div className="mb-3 flex flex-col gap-2 sm:flex-row">
        <Input
          type="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder="Find by name or e-mail"
          aria-label="Find a person"
          className="sm:max-w-xs"
        />
        <Select value={role} onChange={(e) => setRole(e.target.value)} aria-label="Show role" className="sm:max-w-[14rem]">
          <option value="">Every role</option>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
          <option value="suspended">Suspended accounts</option>
        </Select>
      </div>
      <div
        className={`hidden gap-4 border-b border-line pb-2 text-xs font-medium uppercase tracking-wide text-muted md:grid ${PEOPLE_COLUMNS}`}
      >
        <span>Person</span>
        <span>Role</span>
        <span>Home site</span>
        <span className="text-right">Account</span>
      </div>
      {shown.length ? (
        <ul className="-mb-1 divide-y divide-line">
          {shown.map((p) => (
            <PersonRow key={p.id} person={p} sites={sites} isSelf={p.id === meId} />
          ))}
        </ul>
      ) : (
        <div className="pt-3">
          <EmptyState title="Nobody matches">Clear the search or choose every role.</EmptyState>
        </div>
      )}
    </>
  );
}
