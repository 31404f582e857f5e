"use client";
// The case list: filters, table (cards on a phone), pages and the CSV export of the filtered set.
import { useCallback, useEffect, useMemo, useState } from "react";
import { getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { buttonClass, ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import type { CaseListOptions } from "@/lib/cases/types";
import type { CaseColumnId } from "@/lib/cases/list-columns";
import { EXPORT_CAP } from "@/lib/cases/list-csv";
import {
  activeFilterCount,
  DEFAULT_LIST_PARAMS,
  listParamsToQuery,
  toggleSort,
  withFilters,
  type CaseFilters,
  type CaseSort,
} from "@/lib/cases/list-query";
import { CaseCards } from "./case-cards";
import { caseColumns } from "./case-columns";
import { CaseTable } from "./case-table";
import { ColumnChooser } from "./column-chooser";
import { FilterBar } from "./filter-bar";
import { Icon } from "./icons";
import { LoadFailed, NoCases, PastTheEnd } from "./list-states";
import { Pager } from "./pager";
import { PhoneSort } from "./phone-sort";
import { CardSkeleton, TableSkeleton } from "./skeletons";
import { useCasePage } from "./use-case-page";
import { useColumnVisibility } from "./use-column-visibility";
import { useListState } from "./use-list-state";

type Props = { options: CaseListOptions; canCreate: boolean; scopeNote: string };

export function CaseListView({ options, canCreate, scopeNote }: Props) {
  const { params, error: linkError, navigate } = useListState();
  const query = listParamsToQuery(params);
  const { data, error, isLoading, mutate } = useCasePage(query);
  const { visibility, setVisibility, reset } = useColumnVisibility();
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 60_000);
    return () => clearInterval(timer);
  }, []);

  const columns = useMemo(() => caseColumns(now), [now]);
  const table = useReactTable({
    data: data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => r.id,
    manualPagination: true,
    manualSorting: true,
    manualFiltering: true,
    rowCount: data?.total ?? 0,
    state: { columnVisibility: visibility, sorting: [{ id: params.sort.field, desc: params.sort.dir === "desc" }] },
    onColumnVisibilityChange: setVisibility,
  });

  const setFilters = useCallback(
    (patch: Partial<CaseFilters>, opts?: { replace?: boolean }) => navigate(withFilters(params, patch), opts),
    [params, navigate],
  );
  const clear = useCallback(() => navigate({ ...params, filters: {}, page: 1 }), [params, navigate]);
  const onSort = useCallback((field: CaseColumnId) => navigate(toggleSort(params, field)), [params, navigate]);
  const setSort = (sort: CaseSort) => navigate({ ...params, sort, page: 1 });
  const setPage = (page: number) => {
    navigate({ ...params, page });
    window.scrollTo({ top: 0, behavior: "smooth" });
  };

  const filtered = activeFilterCount(params.filters) > 0;
  const exportQuery = listParamsToQuery(params, { paging: false });
  const busy = Boolean(data) && isLoading;
  const total = data?.total ?? 0;
  const visibleColumns = table.getVisibleLeafColumns().length;

  return (
    <>
      <PageHeader
        title="Cases"
        subtitle={scopeNote}
        actions={
          <>
            <a
              href={`/api/cases/export${exportQuery ? `?${exportQuery}` : ""}`}
              download
              data-testid="export-csv"
              className={buttonClass({ variant: "secondary" })}
              title={
                total > EXPORT_CAP
                  ? `The file holds the first ${EXPORT_CAP.toLocaleString("en-US")} of ${total.toLocaleString("en-US")} cases.`
                  : "Every case that matches the filters, as a spreadsheet file."
              }
            >
              <Icon name="download" />
              Export CSV
            </a>
            {canCreate ? (
              <ButtonLink href="/cases/new">
                <Icon name="plus" />
                New removal
              </ButtonLink>
            ) : null}
          </>
        }
      />
      {linkError ? (
        <p role="status" className="mb-4 rounded-lg border border-warn/40 bg-warn-soft px-4 py-2.5 text-sm text-ink-2">
          This link asks for something the list can&apos;t show ({linkError}) — showing all cases instead.{" "}
          <button
            type="button"
            className="font-medium text-accent underline"
            onClick={() => navigate(DEFAULT_LIST_PARAMS, { replace: true })}
          >
            Tidy the link
          </button>
        </p>
      ) : null}
      <section className="relative overflow-hidden rounded-xl border border-line bg-surface shadow-[0_1px_2px_rgba(15,23,42,0.04)]">
        {busy ? <div className="absolute inset-x-0 top-0 z-20 h-0.5 animate-pulse bg-accent" aria-hidden /> : null}
        <div className="border-b border-line p-4 sm:p-5">
          <FilterBar filters={params.filters} options={options} onChange={setFilters} onClear={clear} />
        </div>
        <div className="flex items-center justify-between gap-3 px-4 py-2.5 sm:px-5">
          <p className="whitespace-nowrap text-sm text-muted tabular" data-testid="case-count" aria-live="polite">
            {data ? (
              <>
                <strong className="font-semibold text-ink">{total.toLocaleString("en-US")}</strong> {total === 1 ? "case" : "cases"}
                {filtered ? " match" : ""}
              </>
            ) : (
              "Loading…"
            )}
            {total > EXPORT_CAP ? (
              <span className="ml-2 text-xs">(export holds the first {EXPORT_CAP.toLocaleString("en-US")})</span>
            ) : null}
          </p>
          <div className="flex items-center gap-2">
            <PhoneSort sort={params.sort} onChange={setSort} />
            <div className="hidden md:block">
              <ColumnChooser table={table} onReset={reset} />
            </div>
          </div>
        </div>
        {error && !data ? (
          <LoadFailed message={error.message} onRetry={() => mutate()} />
        ) : !data ? (
          <>
            <TableSkeleton columns={visibleColumns} rows={Math.min(params.pageSize, 10)} />
            <CardSkeleton />
          </>
        ) : total === 0 ? (
          <NoCases filtered={filtered} canCreate={canCreate} onClear={clear} />
        ) : data.rows.length === 0 ? (
          <PastTheEnd pageCount={data.pageCount} onPage={setPage} />
        ) : (
          <>
            {error ? <LoadFailed message={error.message} onRetry={() => mutate()} /> : null}
            <div className="hidden border-t border-line md:block">
              <CaseTable table={table} sort={params.sort} onSort={onSort} busy={busy} />
            </div>
            <div className="border-t border-line md:hidden">
              <CaseCards rows={data.rows} busy={busy} />
            </div>
          </>
        )}
        {data && total > 0 ? (
          <Pager
            page={params.page}
            pageSize={params.pageSize}
            total={total}
            onPage={setPage}
            onPageSize={(pageSize) => navigate({ ...params, pageSize, page: 1 })}
          />
        ) : null}
      </section>
    </>
  );
}
