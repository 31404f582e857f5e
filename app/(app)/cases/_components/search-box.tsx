"use client";
// Free text over case number, serial and car; waits for a pause in typing before it asks the server.
import { useEffect, useRef, useState } from "react";
import { Icon } from "./icons";

export function SearchBox({ value, onChange }: { value: string; onChange: (q: string) => void }) {
  const [text, setText] = useState(value);
  const sent = useRef(value);
  const report = useRef(onChange);
  useEffect(() => {
    report.current = onChange;
  });

  // The URL changed on its own (back button, a cleared filter): show what it says.
  useEffect(() => {
    if (value !== sent.current) {
      sent.current = value;
      setText(value);
    }
  }, [value]);

  useEffect(() => {
    if (text.trim() === sent.current.trim()) return;
    const timer = setTimeout(() => {
      sent.current = text.trim();
      report.current(text.trim());
    }, 350);
    return () => clearTimeout(timer);
  }, [text]);

  return (
    <div className="relative min-w-0 flex-1 sm:max-w-sm">
      <Icon name="search" className="pointer-events-none absolute left-3 top-1/2 h-4 w-4 -translate-y-1/2 text-muted" />
      <input
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        placeholder="Search case, serial or car"
        aria-label="Search by case number, serial or car"
        maxLength={100}
        data-testid="case-search"
        className="h-11 w-full rounded-lg border border-line-strong bg-surface pl-9 pr-9 text-[15px] text-ink placeholder:text-muted focus:border-transparent focus:outline-2 focus:outline-accent sm:h-9 sm:text-sm [&::-webkit-search-cancel-button]:hidden"
      />
      {text ? (
        <button
          type="button"
          aria-label="Clear search"
          onClick={() => setText("")}
          className="absolute right-1.5 top-1/2 grid h-8 w-8 -translate-y-1/2 place-items-center rounded-md text-muted hover:bg-surface-2 hover:text-ink"
        >
          <Icon name="x" className="h-3.5 w-3.5" />
        </button>
      ) : null}
    </div>
  );
}
