"use client";
// One page of the list from GET /api/cases. The previous page stays on screen while the next loads.
import useSWR from "swr";
import type { CaseListRow } from "@/lib/cases/list-columns";

export type CasePage = { rows: CaseListRow[]; total: number; page: number; pageSize: number; pageCount: number };

async function fetchPage(url: string): Promise<CasePage> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  if (res.status === 401) throw new Error("Your session has ended. Sign in again to see the cases.");
  const body = (await res.json().catch(() => null)) as (CasePage & { error?: string }) | null;
  if (!res.ok || !body) throw new Error(body?.error ?? `The cases could not be loaded (error ${res.status}). Try again.`);
  return body;
}

export function useCasePage(query: string) {
  return useSWR<CasePage, Error>(`/api/cases${query ? `?${query}` : ""}`, fetchPage, {
    keepPreviousData: true,
    revalidateOnFocus: true,
    dedupingInterval: 2000,
  });
}
