"use client";
// Damage code picker: type a code, its name or a shop word ("rust", "flaking", "pitting"), typos welcome.
import { useMemo, useState } from "react";
import { createCodeSearch, type CodeSearchEntry } from "@/lib/classification/code-search";
import { inputClass } from "@/components/ui/field";

export type PickerEntry = CodeSearchEntry & { family?: string | null };

export function CodePicker({
  entries,
  value,
  onChange,
  id,
}: {
  entries: PickerEntry[];
  value: string;
  onChange: (code: string) => void;
  id: string;
}) {
  const search = useMemo(() => createCodeSearch(entries), [entries]);
  const current = entries.find((e) => e.code === value);
  const [query, setQuery] = useState("");
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const hits = open ? search(query, { limit: 8 }) : [];

  const pick = (code: string) => {
    onChange(code);
    setQuery("");
    setOpen(false);
  };

  return (
    <div className="relative">
      <input
        id={id}
        role="combobox"
        aria-expanded={open}
        aria-controls={`${id}-list`}
        aria-autocomplete="list"
        className={inputClass}
        placeholder={current ? `${current.label} (${current.code})` : "Type what you see: spall, rust, pitting, arc…"}
        value={query}
        onFocus={() => setOpen(true)}
        onBlur={() => setTimeout(() => setOpen(false), 150)}
        onChange={(e) => {
          setQuery(e.target.value);
          setActive(0);
          setOpen(true);
        }}
        onKeyDown={(e) => {
          if (e.key === "ArrowDown") setActive((a) => Math.min(a + 1, hits.length - 1));
          if (e.key === "ArrowUp") setActive((a) => Math.max(a - 1, 0));
          if (e.key === "Enter" && hits[active]) {
            e.preventDefault();
            pick(hits[active].entry.code);
          }
          if (e.key === "Escape") setOpen(false);
        }}
      />
      {current && !query ? (
        <p className="mt-1 text-xs text-muted">
          Chosen: <strong className="text-ink-2">{current.label}</strong> · {current.code}
        </p>
      ) : null}
      {open && hits.length ? (
        <ul
          id={`${id}-list`}
          role="listbox"
          className="absolute z-30 mt-1 max-h-72 w-full overflow-auto rounded-lg border border-line-strong bg-surface shadow-lg"
        >
          {hits.map((h, i) => (
            <li
              key={h.entry.code}
              role="option"
              aria-selected={i === active}
              onMouseDown={(e) => {
                e.preventDefault();
                pick(h.entry.code);
              }}
              className={`cursor-pointer px-3 py-2 text-sm ${i === active ? "bg-accent-soft" : ""}`}
            >
              <span className="font-medium">{h.entry.label}</span> <span className="text-xs text-muted">{h.entry.code}</span>
              {h.matchedOn === "synonym" || h.matchedOn === "description" ? (
                <span className="block text-xs text-muted">matched “{h.matchedText}”</span>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
