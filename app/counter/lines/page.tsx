import type { Metadata } from "next";
import { connection } from "next/server";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { LinesBrandAdd } from "@/components/counter/lines-brand-add";
import { LinesBrandList } from "@/components/counter/lines-brand-list";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { listBrands } from "@/lib/brands/queries";
import { getDb } from "@/lib/database/app-database";

export const metadata: Metadata = { title: "Counter · Lines", robots: { index: false } };

export default async function CounterLinesPage() {
  const access = await requirePageUser("/counter/lines", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  await connection();
  const { brands } = await listBrands(await getDb());
  return (
    <section className="flex flex-col gap-8">
      <PageIntro eyebrow="Counter" title="Brands and lines">
        <p>
          Every item belongs to a tread line of a brand. Add them here before adding their items. A retired line keeps its items, still listed and for sale,
          but takes no new ones; un-retire it to add items again.
        </p>
      </PageIntro>
      <LinesBrandAdd />
      <LinesBrandList brands={brands} />
    </section>
  );
}
