const usd = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });

/** Prices are stored as whole cents; shown as $189.99. */
export function formatPrice(cents: number): string {
  return usd.format(cents / 100);
}
