/**
 * What a set of tires costs out the door, as an estimate: the tires, fitting, disposal and the
 * per-tire fee, and sales tax. Pure, and integer arithmetic only (BigInt for the products, so that no
 * price, however large, loses a cent); the one rounding is the tax's, half-up, once for the whole set.
 */

/** What the shop charges beyond the tires, per tire in cents; the tax rate in basis points (725 = 7.25 %). */
export interface ShopCharges {
  fittingPerTireCents: number;
  disposalPerTireCents: number;
  /** A per-new-tire fee some states charge; never taxed. */
  tireFeePerTireCents: number;
  taxRateBp: number;
  /** Whether fitting and disposal are taxed as well as the tires. */
  taxServices: boolean;
}

/** Every figure in cents. */
export interface Estimate {
  quantity: number;
  /** priceCents × quantity. */
  tiresCents: number;
  /** Fitting (mounting and balancing) × quantity. */
  servicesCents: number;
  /** (Disposal of the old tire + the per-tire fee) × quantity. */
  feesCents: number;
  /** The taxable sum × the rate, rounded half-up once. */
  taxCents: number;
  totalCents: number;
}

const BASIS_POINTS = 10_000n;

function wholeCents(name: string, value: number): bigint {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number of cents ≥ 0, not ${value}`);
  return BigInt(value);
}

const toNumber = (cents: bigint): number => {
  if (cents > BigInt(Number.MAX_SAFE_INTEGER)) throw new RangeError(`${cents} cents is beyond exact arithmetic`);
  return Number(cents);
};

/** One tire of a package: its price each and how many. */
export interface PackageLine {
  priceCents: number;
  quantity: number;
}

/**
 * The estimate for `quantity` tires at `priceCents` each:
 * tires = price × quantity; services = fitting × quantity; fees = (disposal + tire fee) × quantity;
 * tax = taxable × rate ÷ 10,000 rounded half-up, where taxable is the tires, plus fitting and disposal
 * when the shop taxes services (the tire fee never); total = tires + services + fees + tax.
 */
export function estimateSet(priceCents: number, quantity: number, charges: ShopCharges): Estimate {
  return estimatePackage([{ priceCents, quantity }], charges);
}

/**
 * The estimate for tires bought together (an offer's lines): the same sums as `estimateSet` over
 * every line, with the tax rounded once for the whole package, so the total is never a cent off
 * what the lines add up to before tax.
 */
export function estimatePackage(lines: readonly PackageLine[], charges: ShopCharges): Estimate {
  if (lines.length === 0) throw new RangeError("a package has at least one line");
  for (const { quantity } of lines) {
    if (!Number.isSafeInteger(quantity) || quantity < 1) throw new RangeError(`quantity must be a whole number ≥ 1, not ${quantity}`);
  }
  const quantity = lines.reduce((sum, line) => sum + line.quantity, 0);
  const count = BigInt(quantity);
  const taxRate = wholeCents("taxRateBp", charges.taxRateBp);
  if (taxRate > BASIS_POINTS) throw new RangeError(`taxRateBp must be at most 10000, not ${charges.taxRateBp}`);
  const tires = lines.reduce((sum, line) => sum + wholeCents("priceCents", line.priceCents) * BigInt(line.quantity), 0n);
  const fitting = wholeCents("fittingPerTireCents", charges.fittingPerTireCents) * count;
  const disposal = wholeCents("disposalPerTireCents", charges.disposalPerTireCents) * count;
  const tireFee = wholeCents("tireFeePerTireCents", charges.tireFeePerTireCents) * count;
  const taxable = tires + (charges.taxServices ? fitting + disposal : 0n);
  // Half-up: add half a unit of the divisor, then divide (BigInt division truncates, and nothing here is negative).
  const tax = (taxable * taxRate + BASIS_POINTS / 2n) / BASIS_POINTS;
  const fees = disposal + tireFee;
  return {
    quantity,
    tiresCents: toNumber(tires),
    servicesCents: toNumber(fitting),
    feesCents: toNumber(fees),
    taxCents: toNumber(tax),
    totalCents: toNumber(tires + fitting + fees + tax),
  };
}

/** An estimate line by line as every breakdown words it, on pages and in e-mails (the total is `totalCents`). */
export function estimateRows(estimate: Estimate, tiresLabel: string): [string, number][] {
  return [
    [tiresLabel, estimate.tiresCents],
    ["Fitting", estimate.servicesCents],
    ["Disposal & fees", estimate.feesCents],
    ["Tax", estimate.taxCents],
  ];
}
