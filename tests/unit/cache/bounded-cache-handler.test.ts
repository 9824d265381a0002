import { describe, expect, it } from "vitest";
import BoundedCacheHandler, { BoundedStore, storedBytes } from "@/lib/cache/bounded-cache-handler.mjs";

const page = (html: string, extra: Record<string, unknown> = {}) => ({
  kind: "APP_PAGE",
  html,
  rscData: Buffer.from("rsc"),
  headers: { "x-next-cache-tags": "_N_T_/layout,_N_T_/learn,shop" },
  status: 200,
  ...extra,
});
const read = (data: unknown, tags: string[]) => ({ kind: "FETCH", data: { body: JSON.stringify(data) }, tags, revalidate: false });

describe("the bounded cache", () => {
  it("keeps a page and answers it until one of its tags is revalidated", async () => {
    const store = new BoundedStore(1024 * 1024);
    await store.set("/learn", page("<p>lesson</p>"));
    expect((await store.get("/learn"))?.value).toMatchObject({ html: "<p>lesson</p>" });
    await store.revalidateTag(["shop"]);
    expect(await store.get("/learn")).toBeNull();
  });

  it("drops a cached read by the tags it was stored with, and leaves others", async () => {
    const store = new BoundedStore(1024 * 1024);
    await store.set("contact", read({ phone: "(555) 014-2290" }, ["shop"]), { tags: ["shop"] });
    await store.set("other", read({ any: 1 }, ["elsewhere"]), { tags: ["elsewhere"] });
    await store.revalidateTag("shop");
    expect(await store.get("contact")).toBeNull();
    expect(await store.get("other")).not.toBeNull();
  });

  it("never keeps an answer other than a 200: a 404, a redirect, an empty value", async () => {
    expect(storedBytes(page("<p>not found</p>", { status: 404 }))).toBeNull();
    expect(storedBytes(page("", { status: 308 }))).toBeNull();
    expect(storedBytes({ kind: "APP_ROUTE", body: Buffer.from("Not a tire size"), headers: {}, status: 404 })).toBeNull();
    expect(storedBytes({ kind: "REDIRECT", props: {} })).toBeNull();
    expect(storedBytes(null)).toBeNull();
    const store = new BoundedStore(1024 * 1024);
    await store.set("/size/not-a-size", page("<p>not found</p>", { status: 404 }));
    expect(await store.get("/size/not-a-size")).toBeNull();
  });

  it("holds no more than its bound however many pages come, the least recently used going first", async () => {
    const html = "x".repeat(1000);
    const store = new BoundedStore(10_000);
    for (let width = 100; width < 400; width += 5) await store.set(`/size/${width}-50R20`, page(html));
    expect(store.bytes).toBeLessThanOrEqual(10_000);
    expect(store.entries.size).toBeGreaterThan(0);
    expect(store.entries.size).toBeLessThan(10);
    const kept = [...store.entries.keys()];
    await store.get(kept[0]!);
    await store.set("/size/395-50R22", page(html));
    expect(store.entries.has(kept[0]!), "the page just read stays").toBe(true);
    expect(store.entries.has(kept[1]!), "the least recently used goes").toBe(false);
  });

  it("refuses an entry larger than the whole bound, and replacing an entry counts it once", async () => {
    const store = new BoundedStore(2_000);
    await store.set("/big", page("x".repeat(5_000)));
    expect(store.entries.size).toBe(0);
    await store.set("/learn", page("a".repeat(500)));
    await store.set("/learn", page("b".repeat(500)));
    expect(store.entries.size).toBe(1);
    expect(store.bytes).toBe("/learn".length + 500 + 3);
  });

  it("tells Next.js to forget the paths it refuses or lets go, and only those, so that nothing else grows per path", async () => {
    const forgotten: string[] = [];
    const store = new BoundedStore(2_500, (key) => forgotten.push(key));
    await store.set("/size/not-a-size", page("<p>not found</p>", { status: 404 }));
    await store.set("/size/285-50r20", page("", { status: 308 }));
    await store.set("/size/285-50R20", page("x".repeat(1_000)));
    await store.set("/size/245-35R21", page("x".repeat(1_000)));
    expect(forgotten).toEqual(["/size/not-a-size", "/size/285-50r20"]);
    await store.set("/size/225-45R17", page("x".repeat(1_000)));
    expect(forgotten).toEqual(["/size/not-a-size", "/size/285-50r20", "/size/285-50R20"]);
    await store.revalidateTag("shop");
    expect(forgotten).toEqual(["/size/not-a-size", "/size/285-50r20", "/size/285-50R20", "/size/245-35R21", "/size/225-45R17"]);
  });

  it("is one store for every handler Next.js makes (one per request), starting empty", async () => {
    const first = new BoundedCacheHandler({ maxMemoryCacheSize: 1024 * 1024 });
    expect(await first.get("/learn")).toBeNull();
    await first.set("/learn", page("<p>lesson</p>"), {});
    expect(await new BoundedCacheHandler({ maxMemoryCacheSize: 1024 * 1024 }).get("/learn")).not.toBeNull();
  });
});
