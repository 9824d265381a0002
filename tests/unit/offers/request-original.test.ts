import { describe, expect, it } from "vitest";
import { originalFromText } from "@/lib/offers/request-original";

describe("the tire on the car, read from a request's own words", () => {
  it("reads what the finder fills in, a dual rating and a load range among it", () => {
    expect(originalFromText("Replacing 225/65R17 102H\nBrand Line 225/65R17 104H")).toMatchObject({ designation: "225/65R17", loadIndex: 102, speedSymbol: "H" });
    expect(originalFromText("Replacing LT265/75R16 123/120S, load range E")).toMatchObject({ loadIndex: 123, loadIndexDual: 120, speedSymbol: "S", loadRange: "E" });
  });

  it("reads a size with its service description typed at the counter", () => {
    expect(originalFromText("235/65R17 104H")).toMatchObject({ designation: "235/65R17", loadIndex: 104 });
  });

  it("knows no original from words without a service description", () => {
    for (const text of ["235/65R17", "Two trailer tires, please", "", "Replacing 225/65R17"]) expect(originalFromText(text), text).toBeNull();
  });
});
