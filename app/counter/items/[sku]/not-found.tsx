import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

export default function ItemNotFound() {
  return (
    <section>
      <PageIntro eyebrow="404 · not in the catalog" title="No current item has this SKU">
        <p>It may be mistyped, or the item was retired (retired items keep their SKU but can no longer be edited).</p>
      </PageIntro>
      <Link href="/counter" prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Search the catalog
      </Link>
    </section>
  );
}
