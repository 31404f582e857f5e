"use client";
// One page of the list from GET /api/cases. The previous page stays on screen while the next loads.
import useSWR from "swr";
import type { CaseListRow } from "@/lib/cases/list-columns";
import { ApiError, callApi } from "@/lib/client/api";

export type CasePage = { rows: CaseListRow[]; total: number; page: number; pageSize: number; pageCount: number };

async function fetchPage(url: string): Promise<CasePage> {
  const res = await callApi<CasePage>("GET", url);
  if (!res.ok && res.status === 401) throw new ApiError({ ...res, message: "Your session has ended. Sign in again to see the cases." });
  if (!res.ok) throw new ApiError(res);
  if (!res.data) throw new Error("The cases could not be loaded. Try again.");
  return res.data;
}

export function useCasePage(query: string) {
  return useSWR<CasePage, Error>(`/api/cases${query ? `?${query}` : ""}`, fetchPage, {
    keepPreviousData: true,
    revalidateOnFocus: true,
    dedupingInterval: 2000,
  });
}
