import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { decodeAlternativesCursor, encodeAlternativesCursor } from "@/lib/alternatives/cursor";
import { decodeCatalogCursor, encodeCatalogCursor } from "@/lib/catalog/cursor";

describe("cursors", () => {
  it("give back the exact sort key, price and SKU", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("diameter", "price", "loadMargin" as const),
        fc.double({ noNaN: true, noDefaultInfinity: true }),
        fc.integer({ min: 0 }),
        fc.stringMatching(/^[!-~]{1,64}$/),
        (sort, key, priceCents, sku) => {
          const cursor = { sort, key, priceCents, sku };
          expect(decodeAlternativesCursor(encodeAlternativesCursor(cursor))).toEqual({ ...cursor, key: key === 0 ? 0 : key });
        },
      ),
      { seed: 99, numRuns: 200 },
    );
    expect(decodeCatalogCursor(encodeCatalogCursor("QNS-10233"))).toBe("QNS-10233");
  });

  it("refuse anything they did not make", () => {
    for (const text of ["", "abc", "%%%", Buffer.from('{"sort":"size"}').toString("base64url"), encodeCatalogCursor("X")]) {
      expect(decodeAlternativesCursor(text)).toBeNull();
    }
    expect(decodeCatalogCursor(Buffer.from("[1]").toString("base64url"))).toBeNull();
  });
});
