import { describe, expect, it } from "vitest";
import { compareSizes, formatSpeedGap, formatSpeedToTenth, measurableSizeFromSlug, mphToKmh, speedometerSentence, speedometerVerdict, type UnitSystem } from "@/lib/tire";

// Diameters below are nominal (rim × 25.4 + 2 × width × aspect ratio ÷ 100), worked by hand beside each case.
function sentence(reference: string, fitted: string, units: UnitSystem) {
  const [base, size] = compareSizes([reference, fitted].map((text) => measurableSizeFromSlug(text)!));
  return speedometerSentence(base!.overallDiameterMm, size!, units);
}

describe("the speedometer against UN Regulation No. 39, §5.3 (0 ≤ V1 − V2 ≤ 0.1 × V2 + 4 km/h, V1 shown, V2 true)", () => {
  it("a taller tire makes the speedometer read below the true speed, which §5.3 forbids at every speed", () => {
    // 802.8 mm → 830.8 mm: 50 km/h shown is 51.7 km/h true.
    expect(speedometerVerdict(50, 802.8, 830.8)).toBe("readsBelowTrue");
    expect(speedometerVerdict(120, 802.8, 830.8)).toBe("readsBelowTrue");
  });

  it("a shorter tire reads high, allowed up to 110 % of the true speed plus 4 km/h, so the verdict depends on the speed", () => {
    // 1,000 mm → 870 mm: true = 0.87 × shown; the bound V1 (1 − 1.1 × 0.87) ≤ 4 holds up to 93.0 km/h shown.
    expect(speedometerVerdict(90, 1000, 870)).toBe("readsHigh"); // 90 − 78.3 = 11.7 ≤ 7.83 + 4 = 11.83
    expect(speedometerVerdict(100, 1000, 870)).toBe("readsTooHigh"); // 100 − 87 = 13 > 8.7 + 4 = 12.7
    expect(speedometerVerdict(100, 1000, 880)).toBe("readsHigh"); // 100 − 88 = 12 ≤ 8.8 + 4 = 12.8
  });

  it("the same diameter reads as on the reference, floating-point rounding aside", () => {
    expect(speedometerVerdict(100, 652.4, 652.4)).toBe("same");
    expect(speedometerVerdict(100, 652.4, 652.4 + 1e-9)).toBe("same");
  });
});

describe("the speedometer sentence (100 km/h in metric, 65 mph in imperial)", () => {
  it("265/70R17 → 285/70R17: 65 × 830.8 ÷ 802.8 = 67.27 mph, below the true speed", () => {
    const said = sentence("265/70R17", "285/70R17", "imperial");
    expect(said.text).toBe(
      "On 285/70R17, showing 65 mph, you would be doing 67.3 mph: the speedometer reads 2.3 mph below the true speed, which UN Regulation No. 39 §5.3 forbids.",
    );
    expect(said.breaksRule).toBe(true);
    // 100 × 830.8 ÷ 802.8 = 103.49 km/h.
    expect(sentence("265/70R17", "285/70R17", "metric").text).toContain("showing 100 km/h, you would be doing 103.5 km/h: the speedometer reads 3.5 km/h below");
  });

  it("225/45R17 → 225/50R16, 634.3 → 631.4 mm (−0.46 %): a small change that reads 0.3 mph high, allowed", () => {
    const said = sentence("225/45R17", "225/50R16", "imperial");
    // 65 × 631.4 ÷ 634.3 = 64.70 mph.
    expect(said.text).toBe(
      "On 225/50R16, showing 65 mph, you would be doing 64.7 mph: a small change (−0.5 % in diameter); the speedometer reads 0.3 mph high, within what UN Regulation No. 39 §5.3 allows.",
    );
    expect(said.verdict).toBe("readsHigh");
    expect(said.breaksRule).toBe(false);
  });

  it("225/50R16 → 205/55R16, 631.4 → 631.9 mm (+0.08 %): a small change, said as one and not alarmed", () => {
    const said = sentence("225/50R16", "205/55R16", "metric");
    // 100 × 631.9 ÷ 631.4 = 100.08 km/h. Speedometers are set to read a little high (common practice), which absorbs this.
    expect(said.text).toBe(
      "On 205/55R16, showing 100 km/h, you would be doing 100.1 km/h: a small change (+0.1 % in diameter); the speedometer reads 0.1 km/h below the true speed if it read true on the reference; speedometers are usually set to read a little high, which covers a change this small (common practice), and a fitter can check yours.",
    );
    expect(said.verdict).toBe("slightlyBelowTrue");
    expect(said.breaksRule).toBe(false);
  });

  it("a taller tire from 1 % up is what §5.3 forbids: 634.3 → 640.7 mm (+1.0 %)", () => {
    expect(speedometerVerdict(100, 634.3, 640.7)).toBe("readsBelowTrue");
    expect(speedometerVerdict(100, 634.3, 640.6)).toBe("slightlyBelowTrue"); // +0.99 %
  });

  it("285/75R16 → 205/55R16, 833.9 → 631.9 mm: 75.8 km/h true at 100 shown, more than 110 % + 4 km/h", () => {
    const said = sentence("285/75R16", "205/55R16", "metric");
    // 100 × 631.9 ÷ 833.9 = 75.78; 0.1 × 75.78 + 4 = 11.58 < 100 − 75.78 = 24.22.
    expect(said.text).toBe(
      "On 205/55R16, showing 100 km/h, you would be doing 75.8 km/h: the speedometer reads 24.2 km/h high, more than UN Regulation No. 39 §5.3 allows (110 % of the true speed plus 4 km/h).",
    );
    expect(said.verdict).toBe("readsTooHigh");
  });

  it("the same size twice reads the same", () => {
    expect(sentence("225/45R17", "225/45R17", "imperial").text).toBe("On 225/45R17, showing 65 mph, you would be doing 65.0 mph: the same as on the reference.");
  });
});

describe("speed figures to a tenth", () => {
  it("shows a true speed in the page's unit (1 mile = 1.609344 km exactly, by definition)", () => {
    expect(formatSpeedToTenth(103.488, "metric")).toBe("103.5 km/h");
    expect(formatSpeedToTenth(mphToKmh(67.267), "imperial")).toBe("67.3 mph");
  });

  it("shows a gap without its sign, and one that rounds to nothing as less than a tenth", () => {
    expect(formatSpeedGap(-3.49, "metric")).toBe("3.5 km/h");
    expect(formatSpeedGap(0.03, "metric")).toBe("less than 0.1 km/h");
    expect(formatSpeedGap(mphToKmh(0.04), "imperial")).toBe("less than 0.1 mph");
  });
});
