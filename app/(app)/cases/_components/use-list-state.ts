"use client";
// The list's state is the URL: reading it here and writing it back keeps links shareable and the
// back button meaningful. Next's router follows history.pushState, so no server round trip happens.
import { useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";
import { listParamsToQuery, readListParams, type ListParams } from "@/lib/cases/list-params";

export function useListState() {
  const search = useSearchParams();
  const { params, error } = useMemo(() => readListParams(new URLSearchParams(search.toString())), [search]);
  const navigate = useCallback((next: ListParams, opts: { replace?: boolean } = {}) => {
    const q = listParamsToQuery(next);
    const url = q ? `${window.location.pathname}?${q}` : window.location.pathname;
    if (opts.replace) window.history.replaceState(null, "", url);
    else window.history.pushState(null, "", url);
  }, []);
  return { params, error, navigate, query: listParamsToQuery(params) };
}
