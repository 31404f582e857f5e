// What the list shows when there is nothing to list, or the server could not answer.
import { ButtonLink, Button } from "@/components/ui/button";
import { Icon } from "./icons";

export function NoCases({ filtered, canCreate, onClear }: { filtered: boolean; canCreate: boolean; onClear: () => void }) {
  return (
    <div className="flex flex-col items-center px-6 py-14 text-center" data-testid="case-empty">
      <span className="grid h-12 w-12 place-items-center rounded-full bg-surface-2 text-muted ring-1 ring-line">
        <Icon name="inbox" className="h-6 w-6" />
      </span>
      <p className="mt-4 font-semibold text-ink">{filtered ? "No cases match these filters" : "No cases yet"}</p>
      <p className="mt-1 max-w-sm text-sm text-muted">
        {filtered
          ? "Try fewer filters, a wider date range or other search words."
          : "Every bearing removed from service becomes a case here, from the field report to the signed verdict."}
      </p>
      <div className="mt-5 flex gap-2">
        {filtered ? (
          <Button variant="secondary" onClick={onClear}>
            Clear filters
          </Button>
        ) : null}
        {!filtered && canCreate ? <ButtonLink href="/cases/new">Log a removal</ButtonLink> : null}
      </div>
    </div>
  );
}

export function PastTheEnd({ pageCount, onPage }: { pageCount: number; onPage: (p: number) => void }) {
  return (
    <div className="px-6 py-12 text-center">
      <p className="font-semibold text-ink">This page is past the end of the list</p>
      <p className="mt-1 text-sm text-muted">
        The list has {pageCount} {pageCount === 1 ? "page" : "pages"} now.
      </p>
      <Button variant="secondary" className="mt-4" onClick={() => onPage(pageCount)}>
        Go to the last page
      </Button>
    </div>
  );
}

export function LoadFailed({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <div
      role="alert"
      className="m-4 flex flex-col gap-3 rounded-lg border border-danger/30 bg-danger-soft px-4 py-3 text-sm sm:m-5 sm:flex-row sm:items-center sm:justify-between"
    >
      <p className="text-danger">{message}</p>
      <Button variant="secondary" size="sm" onClick={onRetry}>
        Try again
      </Button>
    </div>
  );
}
