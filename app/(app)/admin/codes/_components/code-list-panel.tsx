"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { Input } from "@/components/ui/field";
import type { CodeListName } from "@/lib/validation/code-entry";
import { CODE_LIST_LABELS } from "@/lib/validation/code-entry";
import { AddCodeForm } from "./add-code-form";
import { CodeRow } from "./code-row";
import type { CodeView } from "./types";

function matches(e: CodeView, needle: string) {
  return [e.code, e.label, e.description, ...e.synonyms].some((t) => t.toLowerCase().includes(needle));
}

export type CodeGroup = { key: string; title: string; subtitle?: string; entries: CodeView[] };

/** One list's codes in groups (damage by family), with the add form above them. */
export function CodeListPanel({ list, groups }: { list: CodeListName; groups: CodeGroup[] }) {
  const [adding, setAdding] = useState(false);
  const [filter, setFilter] = useState("");
  const labels = CODE_LIST_LABELS[list];
  const needle = filter.trim().toLowerCase();
  const shown = groups.map((g) => ({ ...g, entries: needle ? g.entries.filter((e) => matches(e, needle)) : g.entries }));
  return (
    <div className="flex flex-col gap-4">
      {adding ? (
        <Card title={`New ${labels.one}`}>
          <AddCodeForm list={list} onDone={() => setAdding(false)} />
        </Card>
      ) : (
        <div className="flex flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
          <Button onClick={() => setAdding(true)}>Add a {labels.one}</Button>
          <Input
            type="search"
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            placeholder="Filter by code, label or shop word"
            aria-label={`Filter ${labels.title.toLowerCase()}`}
            className="sm:max-w-xs"
          />
        </div>
      )}
      {shown.every((g) => !g.entries.length) ? (
        <EmptyState
          title={needle ? `Nothing in ${labels.title.toLowerCase()} matches “${filter.trim()}”` : `No ${labels.title.toLowerCase()} yet`}
        />
      ) : null}
      {shown
        .filter((g) => g.entries.length)
        .map((g) => (
          <Card
            key={g.key}
            title={
              <span>
                {g.title}
                {g.subtitle ? <span className="ml-2 text-xs font-normal text-muted">{g.subtitle}</span> : null}
              </span>
            }
          >
            <ul className="-my-4 divide-y divide-line">
              {g.entries.map((e) => (
                <CodeRow key={e.code} entry={e} />
              ))}
            </ul>
          </Card>
        ))}
    </div>
  );
}
