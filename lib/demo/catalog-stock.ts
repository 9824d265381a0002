import type { StockItemInput } from "@/lib/stock/build-stock-row";
import { sizeFromSlug } from "@/lib/tire";
import { CATEGORY_TRAITS, DEMO_BRANDS, type LineCategory } from "./catalog-lines";
import { GROUPS_BY_CATEGORY, SIZE_OFFERS, speedSymbolsFor, type SizeOffer } from "./catalog-sizes";
import { seededRandom, type Random } from "./random";

export interface CatalogPlan {
  itemCount: number;
  seed: number;
}

/** The demo shop's stock: about 2,400 items. */
export const DEMO_CATALOG: CatalogPlan = { itemCount: 2400, seed: 20_260_301 };

export interface GeneratedItem {
  brandName: string;
  lineName: string;
  input: StockItemInput;
  retired: boolean;
}

interface LineRef {
  brandIndex: number;
  lineNumber: number;
  name: string;
  category: LineCategory;
}

/** A line in one size and service description, before it gets a SKU, a price and a quantity. */
interface Product {
  line: LineRef;
  designation: string;
  loadIndex: number;
  loadIndexDual: number | null;
  loadRange: string | null;
  extraLoad: boolean;
  speedSymbol: string;
}

type LoadOption = Omit<Product, "line" | "speedSymbol">;

const LINES: readonly LineRef[] = DEMO_BRANDS.flatMap((brand, brandIndex) =>
  brand.lines.map(([name, category], i) => ({ brandIndex, lineNumber: brandIndex * 10 + i, name, category })),
);

function loadOptions(offer: SizeOffer, category: LineCategory): LoadOption[] {
  const plain = { designation: offer.designation, loadIndexDual: null, loadRange: null, extraLoad: false };
  const options: LoadOption[] = [];
  if (offer.standardLoad !== undefined) options.push({ ...plain, loadIndex: offer.standardLoad });
  if (offer.extraLoad !== undefined) options.push({ ...plain, loadIndex: offer.extraLoad, extraLoad: true });
  if (offer.pMetric !== undefined && ["touring", "suv-highway", "all-terrain"].includes(category)) {
    options.push({ ...plain, designation: `P${offer.designation}`, loadIndex: offer.pMetric });
  }
  for (const [range, single, dual] of offer.loadRanges ?? []) options.push({ ...plain, loadIndex: single, loadIndexDual: dual, loadRange: range });
  if (offer.service) options.push({ ...plain, loadIndex: offer.service[0], loadIndexDual: offer.service[1] });
  return options;
}

const aspectOf = (designation: string): number => Number(/\/(\d+)/.exec(designation)?.[1] ?? 100);

/** Summer tires rated W and up in low profiles are marked ZR; (Y) only exists as ZR. */
function withSpeed(option: LoadOption, line: LineRef, speedSymbol: string): Product {
  const lowProfile = aspectOf(option.designation) <= 45;
  const zr = line.category === "summer" && lowProfile && (speedSymbol === "(Y)" || (speedSymbol !== "V" && line.lineNumber % 2 === 1));
  return { ...option, line, speedSymbol, designation: zr ? option.designation.replace("R", "ZR") : option.designation };
}

function productsOf(offer: SizeOffer, random: Random): Product[] {
  const products: Product[] = [];
  for (const line of LINES) {
    if (!GROUPS_BY_CATEGORY[line.category].includes(offer.group)) continue;
    const speeds = speedSymbolsFor(line.category, offer.group).filter((s) => s !== "(Y)" || aspectOf(offer.designation) <= 40);
    for (const option of loadOptions(offer, line.category)) {
      // A line comes in one or two speed ratings per size and load.
      const chosen = random.shuffle(speeds).slice(0, random.int(1, 2));
      for (const speed of chosen) products.push(withSpeed(option, line, speed));
    }
  }
  return random.shuffle(products);
}

/** Splits `total` in proportion to `weights` (largest remainder), so the shares add up exactly. */
function share(total: number, weights: readonly number[]): number[] {
  const sum = weights.reduce((a, b) => a + b, 0);
  if (sum === 0) return weights.map(() => 0);
  const exact = weights.map((w) => (total * w) / sum);
  const counts = exact.map(Math.floor);
  const byRemainder = exact.map((value, i) => [value - Math.floor(value), i] as const).sort((a, b) => b[0] - a[0]);
  for (let k = 0; k < total - counts.reduce((a, b) => a + b, 0); k++) counts[byRemainder[k]![1]]! += 1;
  return counts;
}

/**
 * How many items each size gets: by popularity, but no size more than its distinct products while
 * other sizes still have some to spare; only a catalog larger than all products repeats them.
 */
function quotas(total: number, distinctProducts: readonly number[]): number[] {
  const weights = SIZE_OFFERS.map((offer) => offer.popularity ** 1.5);
  const counts = weights.map(() => 0);
  let remaining = total;
  while (remaining > 0) {
    const room = distinctProducts.map((n, i) => n - counts[i]!);
    const open = weights.map((w, i) => (room[i]! > 0 ? w : 0));
    if (open.every((w) => w === 0)) break;
    const offered = share(remaining, open);
    offered.forEach((n, i) => {
      const taken = Math.min(n, room[i]!);
      counts[i]! += taken;
      remaining -= taken;
    });
  }
  return share(remaining, weights).map((extra, i) => counts[i]! + extra);
}

function priceCents(product: Product, offer: SizeOffer, random: Random): number {
  const size = sizeFromSlug(product.designation);
  const rim = size?.rimDiameterIn ?? 16;
  const width = size?.sectionWidthMm ?? 205;
  const lowProfile = Math.max(0, 55 - (size?.aspectRatio ?? 55)) * 0.8;
  const loadRange = { C: 18, D: 30, E: 45 }[product.loadRange ?? ""] ?? 0;
  const dollars =
    (38 + 7 * rim + 0.3 * (width - 175) + lowProfile + CATEGORY_TRAITS[product.line.category].premium + loadRange +
      (product.extraLoad ? 6 : 0) + (offer.group === "flotation" ? 40 : 0)) *
    (DEMO_BRANDS[product.line.brandIndex]?.priceFactor ?? 1) *
    (0.93 + 0.14 * random.next());
  return Math.max(1, Math.floor(dollars)) * 100 - 1;
}

/** Shelf counts: about one item in six is out of stock, most others a set or two. */
function quantity(random: Random): number {
  if (random.next() < 0.17) return 0;
  const r = random.next();
  return 1 + Math.floor(r * r * 24);
}

/**
 * The stock to seed: `itemCount` items over real sizes, shared out by how common each size is, each
 * size drawn from every line made in it. Beyond the distinct products, products repeat under new SKUs.
 */
export function generateStock(plan: CatalogPlan): GeneratedItem[] {
  if (plan.itemCount > 90_000) throw new Error("the demo generator makes at most 90,000 distinct SKUs");
  const random = seededRandom(plan.seed);
  const productsBySize = SIZE_OFFERS.map((offer) => productsOf(offer, random));
  const counts = quotas(plan.itemCount, productsBySize.map((products) => products.length));
  const items: GeneratedItem[] = [];
  SIZE_OFFERS.forEach((offer, sizeIndex) => {
    const products = productsBySize[sizeIndex] ?? [];
    for (let k = 0; k < (counts[sizeIndex] ?? 0) && products.length > 0; k++) {
      const product = products[k % products.length] as Product;
      const brand = DEMO_BRANDS[product.line.brandIndex] as (typeof DEMO_BRANDS)[number];
      // 7,919 is prime and does not divide 90,000, so the numbers stay distinct up to 90,000 items.
      const sku = `${brand.skuCode}-${10_000 + ((items.length * 7919) % 90_000)}`;
      items.push({
        brandName: brand.name,
        lineName: product.line.name,
        retired: random.next() < 0.02,
        input: {
          sku,
          designation: product.designation,
          loadIndex: product.loadIndex,
          loadIndexDual: product.loadIndexDual,
          speedSymbol: product.speedSymbol,
          loadRange: product.loadRange,
          extraLoad: product.extraLoad,
          priceCents: priceCents(product, offer, random),
          quantity: quantity(random),
        },
      });
    }
  });
  return items;
}
