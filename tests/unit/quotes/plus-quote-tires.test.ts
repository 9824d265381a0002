import { describe, expect, it } from "vitest";
import { plusQuoteTires } from "@/components/quotes/quote-tires";
import { originalFromText } from "@/lib/offers/request-original";

describe("what the Plus planner sends to the shop", () => {
  it("names the tire on the car with its service description, and the picked sizes with the minimums they must meet", () => {
    const tires = plusQuoteTires({ designation: "225/45R17", loadIndex: 94, speedSymbol: "W" }, ["225/40R18", "235/35R19"]);
    expect(tires).toBe("On the car now: 225/45R17 94W\nOn new wheels (load index 94 or more, speed symbol W or better): 225/40R18, 235/35R19");
  });

  it("defers to the placard when the planner was not told the load index and speed symbol", () => {
    expect(plusQuoteTires({ designation: "225/45R17" }, [])).toBe(
      "On the car now: 225/45R17\nOn new wheels (load index and speed symbol at least the vehicle's placard): a size you suggest",
    );
  });

  it("leads with the tire on the car, so an offer made from the request is judged against it, load index and speed symbol included", () => {
    const original = originalFromText(plusQuoteTires({ designation: "225/45R17", loadIndex: 94, speedSymbol: "W" }, ["225/40R18"]));
    expect(original).toMatchObject({ designation: "225/45R17", loadIndex: 94, speedSymbol: "W" });
  });
});
