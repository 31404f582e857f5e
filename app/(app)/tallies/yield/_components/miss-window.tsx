"use client";
// The missed-call window (days) lives in the URL beside the Tallies filters.
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { Input } from "@/components/ui/field";

export function MissWindow({ value }: { value: number }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const [text, setText] = useState(String(value));
  const [error, setError] = useState<string | null>(null);
  function apply(e: React.FormEvent) {
    e.preventDefault();
    const n = Number(text);
    if (!Number.isInteger(n) || n < 1 || n > 730) {
      setError("Use whole days from 1 to 730.");
      return;
    }
    setError(null);
    const q = new URLSearchParams(params.toString());
    if (n === 90) q.delete("miss");
    else q.set("miss", String(n));
    router.push(`${pathname}${q.size ? `?${q}` : ""}`);
  }
  return (
    <form onSubmit={apply} className="mb-4 flex flex-wrap items-center gap-2 text-sm text-ink-2" aria-label="Missed-call window">
      <label htmlFor="miss-window">A keep call counts as missed when the same car and position is removed within</label>
      <span className="inline-flex items-center gap-2">
        <span className="w-20">
          <Input
            id="miss-window"
            inputMode="numeric"
            value={text}
            onChange={(e) => setText(e.target.value)}
            aria-invalid={!!error}
            className="tabular"
          />
        </span>
        <span>days</span>
      </span>
      <button type="submit" className="h-9 rounded-lg border border-line-strong px-3 text-sm font-medium hover:bg-surface-2">
        Apply
      </button>
      {error ? (
        <span role="alert" className="text-danger">
          {error}
        </span>
      ) : null}
    </form>
  );
}
