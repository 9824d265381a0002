"use client";

import useSWRInfinite from "swr/infinite";
import type { AlternativesResponse, ApiErrorBody } from "@/lib/finder/alternatives-response";

export class AlternativesError extends Error {
  constructor(
    message: string,
    readonly status: number,
  ) {
    super(message);
  }
}

async function fetchAlternatives(url: string): Promise<AlternativesResponse> {
  const response = await fetch(url);
  if (!response.ok) {
    const body = (await response.json().catch(() => null)) as ApiErrorBody | null;
    throw new AlternativesError(body?.error.message ?? "The list could not be loaded.", response.status);
  }
  return response.json() as Promise<AlternativesResponse>;
}

/** Pages of equal-or-better tires from the public API, following its cursor. */
export function useAlternatives(search: URLSearchParams | null) {
  const base = search ? `/api/v1/alternatives?${search.toString()}` : null;
  const swr = useSWRInfinite<AlternativesResponse, AlternativesError>(
    (index, previous: AlternativesResponse | null) => {
      if (!base) return null;
      if (index === 0) return base;
      return previous?.nextCursor ? `${base}&cursor=${encodeURIComponent(previous.nextCursor)}` : null;
    },
    fetchAlternatives,
    { revalidateOnFocus: false, revalidateFirstPage: false, keepPreviousData: true },
  );
  const pages = swr.data ?? [];
  const first = pages[0];
  const last = pages[pages.length - 1];
  return {
    first,
    results: pages.flatMap((page) => page.results),
    hasMore: Boolean(last?.nextCursor),
    error: swr.error,
    isLoading: swr.isLoading,
    isLoadingMore: swr.isValidating && swr.size > pages.length,
    loadMore: () => swr.setSize(swr.size + 1),
    retry: () => swr.mutate(),
  };
}
