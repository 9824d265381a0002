import type { Metadata } from "next";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { OutboxFakeInbox } from "@/components/counter/outbox-fake-inbox";
import { OutboxSendTable } from "@/components/counter/outbox-send-table";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { readDevOutbox } from "@/lib/email/dev-outbox";
import { listRecentSends } from "@/lib/email/queries";
import { readShopTimeZone } from "@/lib/shop/queries";

export const metadata: Metadata = { title: "Outbox · Counter", robots: { index: false } };

export default async function CounterOutboxPage() {
  const access = await requirePageUser("/counter/outbox", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const db = await getDb();
  const [outbox, sends, timeZone] = await Promise.all([readDevOutbox(), listRecentSends(db, 50), readShopTimeZone(db)]);
  return (
    <section className="flex flex-col gap-8">
      <PageIntro eyebrow="Counter" title="Outbox">
        <p>Every e-mail the shop sent or tried to send, and, in development, what the local e-mail service received.</p>
      </PageIntro>
      <section aria-labelledby="fake-inbox-heading" className="flex flex-col gap-3">
        <h2 id="fake-inbox-heading" className="text-xl font-semibold">
          Received by the local e-mail service
        </h2>
        <OutboxFakeInbox outbox={outbox} timeZone={timeZone} />
      </section>
      <section aria-labelledby="sends-heading" className="flex flex-col gap-3">
        <h2 id="sends-heading" className="text-xl font-semibold">
          Sends and retries
        </h2>
        <OutboxSendTable sends={sends} timeZone={timeZone} />
      </section>
    </section>
  );
}
