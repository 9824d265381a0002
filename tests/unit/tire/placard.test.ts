import { describe, expect, it } from "vitest";
import { loadIndexKg, placardCheck } from "@/lib/tire";

// Worked examples computed by hand. Rule: GAWR ÷ 2 per tire (÷ 4 with dual wheels); a passenger-car
// tire on an MPV, truck or trailer must be rated for that load × 1.10 (FMVSS 120 S5.1.2).
// Load-index capacities from the ISO 4000-1 / ETRTO table.
describe("the Placard check", () => {
  it("passenger car, front GAWR 1,000 kg: 1,000 ÷ 2 = 500 kg → load index 84 (500 kg)", () => {
    const check = placardCheck([{ name: "Front", gawrKg: 1000, dualWheels: false }], "passenger-car", true, "metric");
    expect(check.minLoadIndex).toBe(84);
    expect(loadIndexKg(84)).toBe(500);
    expect(check.axles[0]?.steps[0]).toBe("Front axle: GAWR 1,000 kg ÷ 2 tires = 500 kg per tire.");
  });

  it("pickup on P-metric tires, rear GAWR 1,814 kg: 907 kg × 1.10 = 997.7 kg → 108 (1,000 kg), not 107 (975 kg)", () => {
    const check = placardCheck([{ name: "Rear", gawrKg: 1814, dualWheels: false }], "mpv-truck-trailer", true, "metric");
    expect(check.axles[0]?.requiredKg).toBeCloseTo(997.7, 6);
    expect(check.minLoadIndex).toBe(108);
    expect(check.axles[0]?.steps[1]).toContain("× 1.10 = 998 kg");
  });

  it("the same pickup on LT tires needs no factor: 907 kg → 105 (925 kg), as 104 carries 900 kg", () => {
    const check = placardCheck([{ name: "Rear", gawrKg: 1814, dualWheels: false }], "mpv-truck-trailer", false, "metric");
    expect(check.minLoadIndex).toBe(105);
    expect(check.axles[0]?.steps).toHaveLength(2);
  });

  it("dual rear wheels, GAWR 4,536 kg on LT tires: 4,536 ÷ 4 = 1,134 kg → dual index 113 (1,150 kg)", () => {
    const check = placardCheck(
      [
        { name: "Front", gawrKg: 2041, dualWheels: false },
        { name: "Rear", gawrKg: 4536, dualWheels: true },
      ],
      "mpv-truck-trailer",
      false,
      "metric",
    );
    // Front: 2,041 ÷ 2 = 1,020.5 kg → 109 (1,030 kg); 108 carries only 1,000 kg.
    expect(check.minLoadIndex).toBe(109);
    expect(check.minLoadIndexDual).toBe(113);
  });

  it("rear GAWR 2,424 kg on LT tires: 1,212 kg per tire → 115, which the table publishes as 1,215 kg (not 10 × LI 35 = 1,210 kg)", () => {
    const check = placardCheck([{ name: "Rear", gawrKg: 2424, dualWheels: false }], "mpv-truck-trailer", false, "metric");
    expect(check.minLoadIndex).toBe(115);
    expect(check.axles[0]?.steps.at(-1)).toBe("The lowest load index carrying at least 1,212 kg is 115 (1,215 kg).");
  });

  it("takes the higher of front and rear", () => {
    const check = placardCheck(
      [
        { name: "Front", gawrKg: 1200, dualWheels: false },
        { name: "Rear", gawrKg: 1400, dualWheels: false },
      ],
      "passenger-car",
      true,
      "metric",
    );
    // 1,200 ÷ 2 = 600 kg → 90 (600 kg); 1,400 ÷ 2 = 700 kg → 96 (710 kg), as 95 carries 690 kg.
    expect(check.axles.map((axle) => axle.minLoadIndex)).toEqual([90, 96]);
    expect(check.minLoadIndex).toBe(96);
  });

  it("writes its arithmetic in pounds for imperial readers (kg × 2.20462)", () => {
    const check = placardCheck([{ name: "Front", gawrKg: 1000, dualWheels: false }], "passenger-car", true, "imperial");
    expect(check.axles[0]?.steps[0]).toBe("Front axle: GAWR 2,205 lb ÷ 2 tires = 1,102 lb per tire.");
  });

  it("says so when no load index is high enough", () => {
    const check = placardCheck([{ name: "Front", gawrKg: 1e9, dualWheels: false }], "passenger-car", true, "metric");
    expect(check.minLoadIndex).toBeNull();
    expect(check.axles[0]?.steps.at(-1)).toMatch(/^No load index/);
  });
});
