import { describe, expect, it } from "vitest";
import { FIT_CARD_SLUG_PATTERN } from "@/lib/fit-cards/card-input";
import { newFitCardSlug, SLUG_BYTES } from "@/lib/fit-cards/slug";

describe("Fit card slugs", () => {
  // At least 128 bits of randomness for a link that must not be guessed (OWASP session-identifier guidance, from memory).
  it("carry at least 128 random bits, as URL-safe base64 (RFC 4648 §5)", () => {
    const slug = newFitCardSlug();
    expect(slug).toMatch(FIT_CARD_SLUG_PATTERN);
    expect(Buffer.from(slug, "base64url")).toHaveLength(SLUG_BYTES);
    expect(SLUG_BYTES * 8).toBeGreaterThanOrEqual(128);
  });

  // A fixed or biased source would show here; repeats of 144-bit values cannot be seen in any sample a test can draw.
  it("use the whole alphabet about evenly", () => {
    const slugs = Array.from({ length: 5000 }, newFitCardSlug);
    const counts = new Map<string, number>();
    for (const character of slugs.join("")) counts.set(character, (counts.get(character) ?? 0) + 1);
    expect(counts.size).toBe(64);
    // 120,000 characters over 64 symbols: about 1,875 each; a fair source stays well within ±15 %.
    for (const count of counts.values()) expect(Math.abs(count - 1875)).toBeLessThan(1875 * 0.15);
  });
});
