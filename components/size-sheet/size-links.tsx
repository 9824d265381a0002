import Link from "next/link";

/**
 * Where to go from a Size sheet, with the size filled in. The finder, the Plus planner and
 * Side-by-side all work by overall diameter, so a size without one (11R22.5) links to the reader only.
 */
export function SizeLinks({ slug, designation, measurable }: { slug: string; designation: string; measurable: boolean }) {
  const byDiameter = [
    { href: `/replace?size=${slug}`, label: "Find replacements in stock", hint: "equal-or-better tires for this size" },
    { href: `/plus?size=${slug}`, label: "Plan a plus size", hint: "sizes for smaller or larger wheels within tolerance" },
    { href: `/compare?sizes=${slug}`, label: "Compare side by side", hint: "draw it against up to three other sizes" },
  ];
  const links = [
    ...(measurable ? byDiameter : []),
    { href: `/?q=${encodeURIComponent(designation)}`, label: "Read a full sidewall", hint: "add the load index, speed symbol or DOT code" },
  ];
  return (
    <nav aria-label="Next steps for this size">
      <ul className="grid gap-2 sm:grid-cols-2">
        {links.map((link) => (
          <li key={link.href}>
            <Link href={link.href} className="group flex min-h-11 flex-col rounded border border-rule bg-sheet px-3 py-2 hover:border-accent">
              <span className="font-semibold text-accent underline underline-offset-4">{link.label}</span>
              <span className="text-sm text-ink-soft">{link.hint}</span>
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
