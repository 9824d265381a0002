import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { estimatePackage, estimateSet, type ShopCharges } from "@/lib/money/estimate";
import { MAX_PRICE_CENTS } from "@/lib/money/money";

// The demo shop's invented charges (lib/demo/shop.ts): $25.00 fitting, $4.00 disposal, a $1.00 tire fee, 7.25 % on tires and services.
const demoCharges: ShopCharges = { fittingPerTireCents: 2_500, disposalPerTireCents: 400, tireFeePerTireCents: 100, taxRateBp: 725, taxServices: true };
const noCharges: ShopCharges = { fittingPerTireCents: 0, disposalPerTireCents: 0, tireFeePerTireCents: 0, taxRateBp: 0, taxServices: false };

// Every example below is worked by hand (worked examples, common practice of US sales tax on a tire invoice).
describe("the out-the-door estimate", () => {
  it("prices a set of four at $182.99 with fitting, disposal, a tire fee and 7.25 % on tires and services", () => {
    // tires     18,299 × 4                     = 73,196
    // services  2,500 × 4                      = 10,000
    // fees      (400 + 100) × 4                =  2,000
    // taxable   73,196 + 10,000 + 400 × 4      = 84,796   (the $1.00 tire fee is never taxed)
    // tax       84,796 × 725 = 61,477,100; (61,477,100 + 5,000) ÷ 10,000 = 6,148.21 → 6,148   (exactly 6,147.71 cents)
    // total     73,196 + 10,000 + 2,000 + 6,148 = 91,344   ($913.44)
    expect(estimateSet(18_299, 4, demoCharges)).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 });
  });

  it("taxes only the tires when the shop does not tax services, rounding once for the set, not per tire", () => {
    // taxable   73,196 (the tires alone)
    // tax       73,196 × 725 = 53,067,100; (53,067,100 + 5,000) ÷ 10,000 = 5,307.21 → 5,307   (exactly 5,306.71)
    //           per tire it would be 18,299 × 725 = 13,266,775 → 1,326.6775 → 1,327, × 4 = 5,308: a cent too much
    // total     73,196 + 10,000 + 2,000 + 5,307 = 90,503
    const estimate = estimateSet(18_299, 4, { ...demoCharges, taxServices: false });
    expect(estimate).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 5_307, totalCents: 90_503 });
    expect(estimate.taxCents).not.toBe(4 * estimateSet(18_299, 1, { ...noCharges, taxRateBp: 725 }).taxCents);
  });

  it("rounds a tax of exactly half a cent up", () => {
    // 2 × $50.05 at 5 %, nothing else: taxable 10,010; 10,010 × 500 = 5,005,000 → exactly 500.5 cents
    // half-up: (5,005,000 + 5,000) ÷ 10,000 = 501 (half-to-even would say 500); total 10,010 + 501 = 10,511
    expect(estimateSet(5_005, 2, { ...noCharges, taxRateBp: 500 })).toEqual({ quantity: 2, tiresCents: 10_010, servicesCents: 0, feesCents: 0, taxCents: 501, totalCents: 10_511 });
    // 2 × $50.04: 10,008 × 500 = 5,004,000 → 500.4 → (5,004,000 + 5,000) ÷ 10,000 = 500.9 → 500
    expect(estimateSet(5_004, 2, { ...noCharges, taxRateBp: 500 }).taxCents).toBe(500);
  });

  it("charges no tax at a rate of 0", () => {
    // total 73,196 + 10,000 + 2,000 + 0 = 85,196
    expect(estimateSet(18_299, 4, { ...demoCharges, taxRateBp: 0 })).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 0, totalCents: 85_196 });
  });

  it("prices one tire and eight", () => {
    // one:   tires 18,299; services 2,500; fees 500; taxable 18,299 + 2,500 + 400 = 21,199
    //        21,199 × 725 = 15,369,275 → (15,369,275 + 5,000) ÷ 10,000 = 1,537.4275 → 1,537; total 18,299 + 2,500 + 500 + 1,537 = 22,836
    expect(estimateSet(18_299, 1, demoCharges)).toEqual({ quantity: 1, tiresCents: 18_299, servicesCents: 2_500, feesCents: 500, taxCents: 1_537, totalCents: 22_836 });
    // eight: tires 146,392; services 20,000; fees 4,000; taxable 146,392 + 20,000 + 3,200 = 169,592
    //        169,592 × 725 = 122,954,200 → (122,954,200 + 5,000) ÷ 10,000 = 12,295.92 → 12,295; total 146,392 + 20,000 + 4,000 + 12,295 = 182,687
    expect(estimateSet(18_299, 8, demoCharges)).toEqual({ quantity: 8, tiresCents: 146_392, servicesCents: 20_000, feesCents: 4_000, taxCents: 12_295, totalCents: 182_687 });
  });

  it("keeps every cent of the largest prices and charges a catalog row can hold", () => {
    const most: ShopCharges = { fittingPerTireCents: MAX_PRICE_CENTS, disposalPerTireCents: MAX_PRICE_CENTS, tireFeePerTireCents: MAX_PRICE_CENTS, taxRateBp: 10_000, taxServices: true };
    // tires 2,147,483,647 × 8 = 17,179,869,176 = services; fees 2 × that = 34,359,738,352
    // taxable 3 × 17,179,869,176 = 51,539,607,528, taxed at 100 %; total 17,179,869,176 × 2 + 34,359,738,352 + 51,539,607,528 = 120,259,084,232
    expect(estimateSet(MAX_PRICE_CENTS, 8, most)).toEqual({
      quantity: 8,
      tiresCents: 17_179_869_176,
      servicesCents: 17_179_869_176,
      feesCents: 34_359_738_352,
      taxCents: 51_539_607_528,
      totalCents: 120_259_084_232,
    });
    // at 99.99 %: 51,539,607,528 × 9,999 = 515,344,535,672,472 → (… + 5,000) ÷ 10,000 = 51,534,453,567.7472 → 51,534,453,567
    expect(estimateSet(MAX_PRICE_CENTS, 8, { ...most, taxRateBp: 9_999 }).taxCents).toBe(51_534_453_567);
  });

  it("adds up and rounds the tax half-up for any set", () => {
    const charges = fc.record({
      fittingPerTireCents: fc.integer({ min: 0, max: 100_000 }),
      disposalPerTireCents: fc.integer({ min: 0, max: 100_000 }),
      tireFeePerTireCents: fc.integer({ min: 0, max: 100_000 }),
      taxRateBp: fc.integer({ min: 0, max: 10_000 }),
      taxServices: fc.boolean(),
    });
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_PRICE_CENTS }), fc.integer({ min: 1, max: 16 }), charges, (price, quantity, shop) => {
        const estimate = estimateSet(price, quantity, shop);
        expect(estimate.totalCents).toBe(estimate.tiresCents + estimate.servicesCents + estimate.feesCents + estimate.taxCents);
        const taxable = BigInt(price * quantity + (shop.taxServices ? (shop.fittingPerTireCents + shop.disposalPerTireCents) * quantity : 0));
        // half-up: the tax is within half a cent of the exact figure, a half rounding up
        const error = BigInt(estimate.taxCents) * 10_000n - taxable * BigInt(shop.taxRateBp);
        expect(error >= -5_000n && error < 5_000n).toBe(true);
      }),
      { seed: 3, numRuns: 1000 },
    );
  });

  it("refuses what is no whole number of cents or tires", () => {
    expect(() => estimateSet(18_299.5, 4, demoCharges)).toThrow(RangeError);
    expect(() => estimateSet(-1, 4, demoCharges)).toThrow(RangeError);
    expect(() => estimateSet(18_299, 0, demoCharges)).toThrow(RangeError);
    expect(() => estimateSet(18_299, 4, { ...demoCharges, taxRateBp: 10_001 })).toThrow(RangeError);
  });

  it("prices a package of two items as one set: the tax on the sum, rounded once", () => {
    // Worked by hand: tires 2 × $182.99 + 2 × $204.49 = $774.96; fitting 4 × $25.00 = $100.00;
    // fees 4 × ($4.00 + $1.00) = $20.00; taxable $774.96 + $100.00 + $16.00 = $890.96;
    // tax 7.25 % = $64.5946 → $64.59; total $774.96 + $100.00 + $20.00 + $64.59 = $959.55.
    const estimate = estimatePackage([{ priceCents: 18_299, quantity: 2 }, { priceCents: 20_449, quantity: 2 }], demoCharges);
    expect(estimate).toEqual({ quantity: 4, tiresCents: 77_496, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_459, totalCents: 95_955 });
    expect(estimatePackage([{ priceCents: 18_299, quantity: 4 }], demoCharges)).toEqual(estimateSet(18_299, 4, demoCharges));
    expect(() => estimatePackage([], demoCharges)).toThrow(RangeError);
  });
});

