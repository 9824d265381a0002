import Link from "next/link";
import { sizeToSlug } from "@/lib/tire/format";
import { hasNominalDiameter } from "@/lib/tire/geometry";
import { rimTwin } from "@/lib/tire/rim-twins";
import { type Marking } from "@/lib/tire/types";

/** Where to go with a size that has been read, each link carrying everything already known. */
export function NextSteps({ marking }: { marking: Marking }) {
  if (!marking.size) return null;
  const slug = sizeToSlug(marking.size);
  const twin = rimTwin(marking.size.rimDiameterIn);
  const service = new URLSearchParams({ size: slug });
  if (marking.service) {
    service.set("loadIndex", String(marking.service.loadIndex));
    if (marking.service.loadIndexDual !== null) service.set("loadIndexDual", String(marking.service.loadIndexDual));
    service.set("speedSymbol", marking.service.speedSymbol);
  }
  if (marking.loadRange) service.set("loadRange", marking.loadRange);
  // Side-by-side, the Plus planner and the finder all work by overall diameter, which an inch-width size (11R22.5) does not give.
  const byDiameter = [
    { href: `/compare?sizes=${slug}`, label: "Side-by-side", hint: "draw it against other sizes" },
    { href: `/plus?${service.toString()}`, label: "Plus planner", hint: "sizes for smaller or larger wheels" },
    { href: `/replace?${service.toString()}`, label: "Replacement finder", hint: "equal-or-better tires in stock" },
  ];
  const links = [
    { href: `/size/${slug}`, label: "Size sheet", hint: "everything about this size, to bookmark or share" },
    ...(hasNominalDiameter(marking.size) ? byDiameter : []),
  ];
  return (
    <section aria-labelledby="next-steps-heading" className="rounded border border-rule bg-sheet p-4">
      <h2 id="next-steps-heading" className="font-semibold">
        Next steps
      </h2>
      <ul className="mt-2 grid gap-1 sm:grid-cols-2">
        {links.map((link) => (
          <li key={link.label}>
            <Link href={link.href} prefetch={false} className="group inline-flex min-h-11 flex-col justify-center py-1">
              <span className="font-semibold text-accent underline underline-offset-4 group-hover:decoration-2">{link.label}</span>
              <span className="text-sm text-ink-soft">{link.hint}</span>
            </Link>
          </li>
        ))}
      </ul>
      <p className="mt-3 border-l-4 border-caution bg-caution-soft px-3 py-2 text-sm text-ink">
        Before you buy: keep the {marking.size.rimDiameterIn}-inch rim diameter{twin === null ? "" : ` (never ${twin}-inch)`}, and never choose a lower load index or speed rating than your
        vehicle&apos;s placard asks for. A qualified fitter should mount and balance the tires.
      </p>
    </section>
  );
}
