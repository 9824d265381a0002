import Link from "next/link";

/** Which widths the list holds, why, and the link to the other list; the address keeps every other setting. */
export function PlusWidthRule({ params, every }: { params: Record<string, string | undefined>; every: boolean }) {
  const other = new URLSearchParams(Object.entries(params).filter((entry): entry is [string, string] => entry[0] !== "all" && entry[1] !== undefined));
  if (!every) other.set("all", "true");
  return (
    <p className="text-ink-soft">
      {every
        ? "Every theoretical size is listed, many of which no wheel of that diameter would take. "
        : "Only the section widths a wheel of that diameter takes in practice are listed: from 10 mm narrower (20 mm on a smaller wheel) to 20 mm wider, plus 10 mm for each inch added (common practice, not a standard). "}
      <Link href={`/plus?${other.toString()}`} prefetch={false} className="text-accent underline underline-offset-4">
        {every ? "Show only the practical widths" : "Show every theoretical size"}
      </Link>
    </p>
  );
}
