"use client";
// The ten most similar earlier cases to this one, each with its score, the reasons it
// matched and photos of the same part side by side; engineers can link one as related.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR, { useSWRConfig } from "swr";
import { StageBadge } from "@/components/ui/badge";
import { getJson, linkCase, linksKey, similarKey, type SimilarAnswer } from "./case-links-api";
import { ReasonChip, ScoreBar } from "./reason-chip";
import { SimilarPhotos } from "./similar-photos";
import type { SimilarCaseItem } from "@/lib/cases/types";

function LinkControl({ caseId, item, onLinked }: { caseId: string; item: SimilarCaseItem; onLinked: () => void }) {
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (item.linked) {
    return (
      <span className="inline-flex items-center gap-1 text-xs font-medium text-ok" data-testid="linked-mark">
        ✓ Linked as related
      </span>
    );
  }
  if (!open) {
    return (
      <button
        type="button"
        onClick={() => setOpen(true)}
        className="h-11 lg:h-9 rounded-lg border border-line-strong bg-surface px-3 text-xs font-medium text-ink-2 hover:bg-surface-2"
        data-testid="link-related"
      >
        Link as related
      </button>
    );
  }
  const submit = async () => {
    setBusy(true);
    setError(null);
    try {
      await linkCase(caseId, item.id, note);
      onLinked();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  return (
    <form
      className="flex w-full flex-col gap-1.5 sm:flex-row sm:items-center"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      <input
        value={note}
        onChange={(e) => setNote(e.target.value)}
        maxLength={500}
        autoFocus
        placeholder="Why are they related? (optional)"
        aria-label="Note on the link"
        className="h-11 lg:h-9 w-full min-w-0 sm:flex-1 rounded-lg border border-line-strong bg-surface px-2.5 text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent"
      />
      <div className="flex gap-1.5">
        <button
          type="submit"
          disabled={busy}
          className="h-11 lg:h-9 rounded-lg bg-accent px-3 text-xs font-semibold text-accent-ink disabled:opacity-50"
        >
          {busy ? "Linking…" : "Link"}
        </button>
        <button type="button" onClick={() => setOpen(false)} className="h-11 lg:h-9 rounded-lg px-3 text-xs text-muted hover:bg-surface-2">
          Cancel
        </button>
      </div>
      {error ? (
        <p role="alert" className="text-xs text-danger sm:basis-full">
          {error}
        </p>
      ) : null}
    </form>
  );
}

function Row({
  item,
  caseId,
  thisNumber,
  canLink,
  onLinked,
}: {
  item: SimilarCaseItem;
  caseId: string;
  thisNumber: string;
  canLink: boolean;
  onLinked: () => void;
}) {
  return (
    <li className="flex flex-col gap-3 py-4 first:pt-0 last:pb-0 sm:flex-row sm:gap-4" data-testid="similar-case">
      <ScoreBar score={item.score} />
      <div className="min-w-0 flex-1">
        <div className="flex flex-wrap items-center gap-2">
          <Link
            href={`/cases/${item.number}`}
            className="inline-flex min-h-11 items-center font-semibold tabular text-ink hover:text-accent lg:min-h-0"
          >
            {item.number}
          </Link>
          <StageBadge stage={item.status} />
        </div>
        <p className="mt-0.5 text-xs text-muted">
          {[
            item.triggerLabel,
            item.causeLabel ? `Cause: ${item.causeLabel}` : "No verdict yet",
            item.bearingClass ? `Class ${item.bearingClass}` : null,
            item.removedOn ? `removed ${item.removedOn}` : null,
            item.siteName,
          ]
            .filter(Boolean)
            .join(" · ")}
        </p>
        <ul className="mt-2 flex flex-wrap gap-1.5" aria-label="Why it matched">
          {item.reasons.map((r) => (
            <ReasonChip key={r.text} reason={r} />
          ))}
        </ul>
        {canLink ? (
          <div className="mt-2.5">
            <LinkControl caseId={caseId} item={item} onLinked={onLinked} />
          </div>
        ) : item.linked ? (
          <p className="mt-2 text-xs font-medium text-ok">✓ Linked as related</p>
        ) : null}
      </div>
      <SimilarPhotos item={item} thisNumber={thisNumber} />
    </li>
  );
}

export function SimilarCases({ caseId, canLink }: { caseId: string; canLink: boolean }) {
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const { data, error, isLoading, mutate: refresh } = useSWR<SimilarAnswer>(similarKey(caseId), getJson, { revalidateOnFocus: false });
  if (isLoading) {
    return (
      <ul className="flex flex-col gap-4" aria-busy="true" aria-label="Finding similar cases">
        {[0, 1, 2].map((i) => (
          <li key={i} className="h-16 animate-pulse rounded-lg bg-surface-2" />
        ))}
      </ul>
    );
  }
  if (error)
    return (
      <p role="alert" className="text-sm text-danger">
        Similar cases could not be loaded: {(error as Error).message}
      </p>
    );
  if (!data?.similar.length) {
    return (
      <p className="text-sm text-muted" data-testid="no-similar">
        No earlier case shares this one&apos;s findings, root cause or trigger and class yet.
      </p>
    );
  }
  const onLinked = () => {
    void refresh();
    void mutate(linksKey(caseId));
    router.refresh(); // a link moves the case version
  };
  return (
    <div>
      <p className="mb-3 text-sm text-muted">
        Earlier cases scored on the damage per part, root cause, trigger, bearing class and words in common. Points show what each reason
        adds.
      </p>
      <ol className="divide-y divide-line" data-testid="similar-cases">
        {data.similar.map((item) => (
          <Row key={item.id} item={item} caseId={caseId} thisNumber={data.number} canLink={canLink} onLinked={onLinked} />
        ))}
      </ol>
    </div>
  );
}
