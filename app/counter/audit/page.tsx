import type { Metadata } from "next";
import { AuditLog } from "@/components/counter/audit-log";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { auditQuerySchema, listAuditEvents } from "@/lib/audit/queries";
import { readShopTimeZone } from "@/lib/shop/queries";

export const metadata: Metadata = { title: "Audit log · Counter", robots: { index: false } };

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePageUser("/counter/audit", "admin");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="admin" />;
  const query = auditQuerySchema.parse(await searchParams);
  const db = await getDb();
  const [listing, timeZone] = await Promise.all([listAuditEvents(db, query), readShopTimeZone(db)]);
  return (
    <section>
      <PageIntro eyebrow="Counter · Admin" title="Audit log">
        <p>Who changed what and when: prices and quantities, items added or retired, catalog imports, role changes and the shop&apos;s settings.</p>
      </PageIntro>
      <AuditLog listing={listing} query={query} timeZone={timeZone} />
    </section>
  );
}
