import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { connection } from "next/server";
import { getDb } from "@/lib/database/app-database";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { ItemForm } from "@/components/counter/item-form";
import { centsToDollarsText } from "@/lib/money/money";
import { ItemRetire } from "@/components/counter/item-retire";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { skuParamsSchema } from "@/lib/stock/item-bodies";
import { listBrands } from "@/lib/brands/queries";
import { getEditableItem } from "@/lib/counter/queries";

export const metadata: Metadata = { title: "Counter · Edit item", robots: { index: false } };

export default async function EditItemPage({ params }: { params: Promise<{ sku: string }> }) {
  const { sku: rawSku } = await params;
  const access = await requirePageUser(`/counter/items/${encodeURIComponent(rawSku)}`, "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const parsed = skuParamsSchema.safeParse({ sku: rawSku });
  if (!parsed.success) notFound();
  await connection();
  const db = await getDb();
  const [item, { brands }] = await Promise.all([getEditableItem(db, parsed.data.sku), listBrands(db)]);
  if (!item) notFound();
  const initial = {
    ...item,
    loadIndex: String(item.loadIndex),
    loadIndexDual: item.loadIndexDual === null ? "" : String(item.loadIndexDual),
    loadRange: item.loadRange ?? "",
    priceCents: centsToDollarsText(item.priceCents),
    quantity: String(item.quantity),
    treadDepth32: item.treadDepth32 === null ? "" : String(item.treadDepth32),
  };
  return (
    <section>
      <Link href={`/counter?q=${encodeURIComponent(item.sku)}`} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        ← Back to the catalog
      </Link>
      <PageIntro eyebrow={`Counter · SKU ${item.sku}`} title={`${item.brand} ${item.line} ${item.designation}`}>
        <p>Change any field; the size is checked again when you save.</p>
      </PageIntro>
      <ItemForm brands={brands} initial={initial} sku={item.sku} />
      <ItemRetire sku={item.sku} />
    </section>
  );
}
