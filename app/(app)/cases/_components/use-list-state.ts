"use client";
// The list's state is the URL: reading it here and writing it back keeps links shareable and the
// back button meaningful. Next's router follows history.pushState, so no server round trip happens.
// The router applies a new URL as a transition; until it lands, the state asked for is shown, so a
// ticked box stays ticked on a slow machine.
import { useSearchParams } from "next/navigation";
import { useCallback, useEffect, useMemo, useState } from "react";
import { listParamsToQuery, readListParams, type ListParams } from "@/lib/cases/list-query";

export function useListState() {
  const search = useSearchParams();
  const fromUrl = useMemo(() => readListParams(new URLSearchParams(search.toString())), [search]);
  const [pending, setPending] = useState<ListParams | null>(null);

  // Drop the pending state once the URL has caught up with it.
  useEffect(() => {
    setPending((p) => (p && listParamsToQuery(p) === listParamsToQuery(fromUrl.params) ? null : p));
  }, [fromUrl]);
  // Back and forward: the URL decides.
  useEffect(() => {
    const onPop = () => setPending(null);
    window.addEventListener("popstate", onPop);
    return () => window.removeEventListener("popstate", onPop);
  }, []);

  const navigate = useCallback((next: ListParams, opts: { replace?: boolean } = {}) => {
    setPending(next);
    const q = listParamsToQuery(next);
    const url = q ? `${window.location.pathname}?${q}` : window.location.pathname;
    if (opts.replace) window.history.replaceState(null, "", url);
    else window.history.pushState(null, "", url);
  }, []);

  const params = pending ?? fromUrl.params;
  return { params, error: pending ? undefined : fromUrl.error, navigate };
}
