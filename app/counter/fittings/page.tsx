import type { Metadata } from "next";
import { connection } from "next/server";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { FittingsBoard } from "@/components/counter/fittings-board";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { getDb } from "@/lib/database/app-database";
import { todayIn } from "@/lib/fittings";
import { formatCalendarDate } from "@/lib/format/format";
import { fittingSpan, fittingsQuerySchema } from "@/lib/offers/fitting-days";
import { listFittings } from "@/lib/offers/queries";
import { readShopSettings } from "@/lib/shop/settings";

export const metadata: Metadata = { title: "Fittings · Counter", robots: { index: false } };

export default async function FittingsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePageUser("/counter/fittings", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const query = fittingsQuerySchema.parse(await searchParams);
  await connection();
  const db = await getDb();
  const settings = await readShopSettings(db);
  const timeZone = settings?.timeZone ?? "UTC";
  const today = todayIn(timeZone, new Date());
  const day = query.day ?? today;
  const span = fittingSpan(day, query.view, timeZone);
  const fittings = await listFittings(db, span.from, span.to);
  const title = query.view === "week" ? `Week of ${formatCalendarDate(span.days[0]!, "full")}` : formatCalendarDate(day, "full");
  return (
    <section className="flex flex-col gap-6">
      <PageIntro eyebrow="Counter · Fittings" title={title}>
        <p>Booked fittings per bay, as drivers chose them from their offers. Mark each one when it is done: fitted sells the held tires, a no-show or a cancellation puts them back on sale.</p>
      </PageIntro>
      <FittingsBoard view={query.view} day={day} today={today} span={span} fittings={fittings} bays={settings?.fittingBays ?? 1} timeZone={timeZone} />
    </section>
  );
}
