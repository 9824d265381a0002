"use client";

import { useEffect, useState } from "react";
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

const asAlternativesError = (error: unknown) => (error instanceof AlternativesError ? error : new AlternativesError("The list could not be loaded.", 0));

/** What has arrived for one request: its search, the attempt at it, the pages so far and any failure. */
interface Loaded {
  base: string;
  attempt: number;
  pages: AlternativesResponse[];
  error: AlternativesError | null;
  loadingMore: boolean;
}

/**
 * Pages of equal-or-better tires from the public API, following its cursor. The last list stays on
 * hand while a changed search loads, and an answer to a search since replaced is dropped.
 */
export function useAlternatives(search: URLSearchParams | null) {
  const base = search ? `/api/v1/alternatives?${search.toString()}` : null;
  const [attempt, setAttempt] = useState(0);
  const [loaded, setLoaded] = useState<Loaded | null>(null);

  useEffect(() => {
    if (!base) return;
    let current = true;
    fetchAlternatives(base).then(
      (page) => current && setLoaded({ base, attempt, pages: [page], error: null, loadingMore: false }),
      (error: unknown) => current && setLoaded((last) => ({ base, attempt, pages: last?.pages ?? [], error: asAlternativesError(error), loadingMore: false })),
    );
    return () => {
      current = false;
    };
  }, [base, attempt]);

  const settled = loaded !== null && loaded.base === base && loaded.attempt === attempt;
  const pages = loaded?.pages ?? [];
  const last = pages[pages.length - 1];
  const loadMore = () => {
    if (!settled || !last?.nextCursor || loaded.loadingMore) return;
    const more = `${loaded.base}&cursor=${encodeURIComponent(last.nextCursor)}`;
    const still = (now: Loaded | null): now is Loaded => now !== null && now.base === loaded.base && now.attempt === loaded.attempt;
    setLoaded({ ...loaded, loadingMore: true });
    fetchAlternatives(more).then(
      (page) => setLoaded((now) => (still(now) ? { ...now, pages: [...now.pages, page], loadingMore: false } : now)),
      (error: unknown) => setLoaded((now) => (still(now) ? { ...now, error: asAlternativesError(error), loadingMore: false } : now)),
    );
  };
  return {
    first: pages[0],
    results: pages.flatMap((page) => page.results),
    hasMore: Boolean(last?.nextCursor),
    error: loaded?.base === base ? (loaded.error ?? undefined) : undefined,
    isLoading: base !== null && !settled,
    isLoadingMore: settled && loaded.loadingMore,
    loadMore,
    retry: () => setAttempt((count) => count + 1),
  };
}
