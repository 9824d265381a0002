import { stockWords } from "@/lib/tire/stock-words";

const tone = { enough: "text-ink", short: "font-semibold text-ink", none: "text-ink-soft" } as const;

/** How many of a tire can be sold now, in words, against how many the driver needs (none given: the plain count). */
export function StockLine({ quantity, needed, className = "" }: { quantity: number; needed?: number; className?: string }) {
  const words = stockWords(quantity, needed);
  return (
    <p className={`text-sm ${tone[words.level]} ${className}`} data-stock={words.level}>
      {words.text}
    </p>
  );
}
