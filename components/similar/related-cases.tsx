"use client";
// Cases linked to this one as related, with the note and who linked them; engineers can
// link another case by number and unlink (both ways, recorded in both histories).
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR, { useSWRConfig } from "swr";
import { StageBadge } from "@/components/ui/badge";
import { getJson, linkCase, linksKey, similarKey, unlinkCase, type LinksAnswer } from "./case-links-api";
import type { CaseLinkItem } from "@/lib/cases/types";
import { formatDay } from "@/lib/dates";

function Unlink({ caseId, link, onDone }: { caseId: string; link: CaseLinkItem; onDone: () => void }) {
  const [confirm, setConfirm] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (!confirm)
    return (
      <button
        type="button"
        onClick={() => setConfirm(true)}
        className="h-11 lg:h-9 self-start rounded-lg border border-line px-2.5 text-xs font-medium text-muted hover:bg-surface-2 hover:text-danger"
        data-testid="unlink"
      >
        Unlink
      </button>
    );
  return (
    <span className="flex flex-wrap items-center gap-1 self-start">
      <button
        type="button"
        className="h-11 lg:h-9 rounded-lg bg-danger px-2.5 text-xs font-semibold text-white"
        data-testid="confirm-unlink"
        onClick={() => unlinkCase(caseId, link.id).then(onDone, (e: Error) => setError(e.message))}
      >
        Unlink {link.number}
      </button>
      <button type="button" onClick={() => setConfirm(false)} className="h-11 lg:h-9 rounded-lg px-2 text-xs text-muted hover:bg-surface-2">
        Keep
      </button>
      {error ? (
        <span role="alert" className="text-xs text-danger">
          {error}
        </span>
      ) : null}
    </span>
  );
}

function AddLink({ caseId, onDone }: { caseId: string; onDone: () => void }) {
  const [number, setNumber] = useState("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async () => {
    setBusy(true);
    setError(null);
    try {
      await linkCase(caseId, number.trim().toUpperCase(), note);
      setNumber("");
      setNote("");
      onDone();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  const input =
    "h-11 lg:h-10 min-w-0 rounded-lg border border-line-strong bg-surface px-2.5 text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent";
  return (
    <form
      className="mt-4 flex flex-col gap-2 border-t border-line pt-4 sm:flex-row"
      onSubmit={(e) => {
        e.preventDefault();
        if (number.trim()) void submit();
      }}
    >
      <input
        value={number}
        onChange={(e) => setNumber(e.target.value)}
        placeholder="Case number, e.g. TL-26-00042"
        aria-label="Case number to link"
        className={`${input} sm:w-56`}
      />
      <input
        value={note}
        onChange={(e) => setNote(e.target.value)}
        maxLength={500}
        placeholder="Note (optional)"
        aria-label="Note on the link"
        className={`${input} w-full sm:flex-1`}
      />
      <button
        type="submit"
        disabled={busy || !number.trim()}
        className="h-11 lg:h-10 rounded-lg border border-line-strong bg-surface px-4 text-sm font-medium text-ink-2 hover:bg-surface-2 disabled:opacity-50"
      >
        Link case
      </button>
      {error ? (
        <p role="alert" className="text-sm text-danger sm:basis-full">
          {error}
        </p>
      ) : null}
    </form>
  );
}

export function RelatedCases({ caseId, canLink }: { caseId: string; canLink: boolean }) {
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const { data, error, isLoading, mutate: refresh } = useSWR<LinksAnswer>(linksKey(caseId), getJson, { revalidateOnFocus: false });
  const changed = () => {
    void refresh();
    void mutate(similarKey(caseId));
    router.refresh(); // a link moves the case version
  };
  if (isLoading) return <div className="h-12 animate-pulse rounded-lg bg-surface-2" aria-busy="true" />;
  if (error)
    return (
      <p role="alert" className="text-sm text-danger">
        Related cases could not be loaded: {(error as Error).message}
      </p>
    );
  const links = data?.links ?? [];
  return (
    <div>
      {links.length === 0 ? (
        <p className="text-sm text-muted" data-testid="no-related">
          No related cases yet.{canLink ? " Link one from the similar cases, or by its number below." : ""}
        </p>
      ) : (
        <ul className="divide-y divide-line" data-testid="related-cases">
          {links.map((l) => (
            <li
              key={l.id}
              className="flex flex-col gap-2 py-3 first:pt-0 last:pb-0 sm:flex-row sm:items-start sm:justify-between"
              data-testid="related-case"
            >
              <div className="min-w-0">
                <div className="flex flex-wrap items-center gap-2">
                  <Link
                    href={`/cases/${l.number}`}
                    className="inline-flex min-h-11 items-center font-semibold tabular text-ink hover:text-accent lg:min-h-0"
                  >
                    {l.number}
                  </Link>
                  <StageBadge stage={l.status} />
                </div>
                <p className="mt-0.5 text-xs text-muted">
                  {[
                    l.triggerLabel,
                    l.causeLabel ? `Cause: ${l.causeLabel}` : "No verdict yet",
                    l.removedOn ? `removed ${l.removedOn}` : null,
                  ]
                    .filter(Boolean)
                    .join(" · ")}
                </p>
                {l.note ? <p className="mt-1 text-sm text-ink-2">“{l.note}”</p> : null}
                <p className="mt-0.5 text-xs text-muted">
                  Linked{l.linkedBy ? ` by ${l.linkedBy}` : ""} on {formatDay(l.linkedAt)}
                </p>
              </div>
              {canLink ? <Unlink caseId={caseId} link={l} onDone={changed} /> : null}
            </li>
          ))}
        </ul>
      )}
      {canLink ? <AddLink caseId={caseId} onDone={changed} /> : null}
    </div>
  );
}
