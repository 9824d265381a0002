import type { Metadata } from "next";
import Link from "next/link";
import { connection } from "next/server";
import { getDb } from "@/lib/database/app-database";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { ItemForm } from "@/components/counter/item-form";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { listBrands } from "@/lib/brands/queries";

export const metadata: Metadata = { title: "Counter · New item", robots: { index: false } };

const EMPTY = { sku: "", brand: "", line: "", designation: "", loadIndex: "", loadIndexDual: "", speedSymbol: "", loadRange: "", extraLoad: false, priceCents: "", quantity: "0", treadDepth32: "" };

export default async function NewItemPage() {
  const access = await requirePageUser("/counter/items/new", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  await connection();
  const { brands } = await listBrands(await getDb());
  return (
    <section>
      <Link href="/counter" prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        ← Back to the catalog
      </Link>
      <PageIntro eyebrow="Counter · catalog" title="Add an item">
        <p>A size of a line the catalog already has (new brands and lines are added on the Lines page). The size is checked as you type.</p>
      </PageIntro>
      <ItemForm brands={brands} initial={EMPTY} />
    </section>
  );
}
