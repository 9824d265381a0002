// @vitest-environment jsdom
import { act, renderHook, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { useAlternatives } from "@/components/finder/use-alternatives";
import type { AlternativesResponse } from "@/lib/finder/alternatives-response";

/** A page as the API answers it, with only what the hook reads filled in. */
const page = (skus: string[], nextCursor: string | null, total = 3) =>
  ({ results: skus.map((sku) => ({ sku })), nextCursor, total, nearMisses: [] }) as unknown as AlternativesResponse;

/** Answers each request in the order the test settles them. */
function fakeApi() {
  const pending = new Map<string, (response: Response) => void>();
  vi.stubGlobal(
    "fetch",
    vi.fn((url: string) => new Promise<Response>((resolve) => pending.set(url, resolve))),
  );
  return {
    urls: () => [...pending.keys()],
    answer: async (url: string, status: number, body: unknown) => {
      await act(async () => pending.get(url)!(new Response(JSON.stringify(body), { status })));
    },
  };
}

afterEach(() => vi.unstubAllGlobals());

describe("the finder's pages of results", () => {
  it("loads the first page, then follows the cursor with Show more", async () => {
    const api = fakeApi();
    const { result } = renderHook(() => useAlternatives(new URLSearchParams("size=285-50R20")));
    expect(result.current.isLoading).toBe(true);
    await api.answer("/api/v1/alternatives?size=285-50R20", 200, page(["a", "b"], "c1"));
    expect(result.current.results.map((tire) => tire.sku)).toEqual(["a", "b"]);
    expect(result.current.hasMore).toBe(true);
    act(() => result.current.loadMore());
    expect(result.current.isLoadingMore).toBe(true);
    await api.answer("/api/v1/alternatives?size=285-50R20&cursor=c1", 200, page(["c"], null));
    expect(result.current.results.map((tire) => tire.sku)).toEqual(["a", "b", "c"]);
    expect(result.current.hasMore).toBe(false);
    expect(result.current.isLoadingMore).toBe(false);
  });

  it("keeps the last list while a changed search loads and drops the answer to a replaced one", async () => {
    const api = fakeApi();
    const { result, rerender } = renderHook(({ search }) => useAlternatives(new URLSearchParams(search)), { initialProps: { search: "sort=price" } });
    await api.answer("/api/v1/alternatives?sort=price", 200, page(["a"], null));
    rerender({ search: "sort=diameter" });
    rerender({ search: "sort=stock" });
    expect(result.current.isLoading).toBe(true);
    expect(result.current.first?.results.map((tire) => tire.sku)).toEqual(["a"]);
    await api.answer("/api/v1/alternatives?sort=stock", 200, page(["s"], null));
    await api.answer("/api/v1/alternatives?sort=diameter", 200, page(["d"], null));
    expect(result.current.isLoading).toBe(false);
    expect(result.current.results.map((tire) => tire.sku)).toEqual(["s"]);
  });

  it("says what the API said was wrong, and asks again on retry", async () => {
    const api = fakeApi();
    const { result } = renderHook(() => useAlternatives(new URLSearchParams("size=285-50R20")));
    await api.answer("/api/v1/alternatives?size=285-50R20", 400, { error: { code: "invalid_parameter", message: "The tolerance must be 1 to 5 %." } });
    expect(result.current.error?.message).toBe("The tolerance must be 1 to 5 %.");
    expect(result.current.error?.status).toBe(400);
    act(() => result.current.retry());
    await waitFor(() => expect(vi.mocked(fetch)).toHaveBeenCalledTimes(2));
    await api.answer("/api/v1/alternatives?size=285-50R20", 200, page(["a"], null));
    expect(result.current.error).toBeUndefined();
    expect(result.current.results.map((tire) => tire.sku)).toEqual(["a"]);
  });
});
