import { describe, expect, it } from "vitest";
import { isSku } from "@/lib/tire";

describe("the SKU rule", () => {
  it("takes 1–64 of A–Z a–z 0–9 - _ ., the characters a URL path keeps as they are (RFC 3986 §2.3)", () => {
    for (const sku of ["QNS-T1", "a", "A.B_C-9", "-lead", "..x", ".x", "newer", "renew", "L".repeat(64)]) expect(isSku(sku), sku).toBe(true);
  });

  it("refuses anything else, the dot segments . and .. (RFC 3986 §5.2.4), and new in any case", () => {
    for (const sku of ["", "A/B", "A B", "A%2F", "x:1?", "Ä1", "é", ".", "..", "new", "NEW", "New", "L".repeat(65), "a\u0000b"]) expect(isSku(sku), sku).toBe(false);
  });
});
