import { and, eq, gte, isNull, lt } from "drizzle-orm";
import { Temporal } from "temporal-polyfill";
import type { Database } from "@/db/client";
import { offer } from "@/db/schema";
import { sendRecordedEmail } from "@/lib/email/recorded-send";
import { endOfLocalDay, todayIn } from "@/lib/fittings";
import { readShopTimeZone } from "@/lib/shop/queries";
import { fittingReminderEmail } from "./fitting-email-content";
import { hasFitting, readOfferFacts } from "./offer-facts";

/** The instants tomorrow spans in a time zone: from the end of today to the end of tomorrow, each day with its own offsets. */
export function tomorrowIn(timeZone: string, now: Date): { from: Date; until: Date } {
  const today = todayIn(timeZone, now);
  const tomorrow = Temporal.PlainDate.from(today).add({ days: 1 }).toString();
  return { from: new Date(endOfLocalDay(today, timeZone)), until: new Date(endOfLocalDay(tomorrow, timeZone)) };
}

/**
 * Sends each driver whose fitting is on the next local date in the shop's zone one reminder. Each
 * offer is claimed first (reminder_sent_at set where it was empty), so two servers running this at
 * once never both send; a send that fails gives its claim back, so the next run tries again under
 * the same key (which delivers at most once). Answers how many reminders were sent. Never throws.
 */
export async function sendDueReminders(db: Database, now: Date = new Date()): Promise<number> {
  try {
    const { from, until } = tomorrowIn(await readShopTimeZone(db), now);
    const claimed = await db
      .update(offer)
      .set({ reminderSentAt: now })
      .where(and(eq(offer.status, "accepted"), isNull(offer.reminderSentAt), gte(offer.fittingStart, from), lt(offer.fittingStart, until)))
      .returning({ id: offer.id });
    let sent = 0;
    for (const { id } of claimed) {
      const reminded = await remind(db, id, now).catch((error: unknown) => {
        console.error(`Fitting reminder for offer ${id} not sent: ${error instanceof Error ? error.message : String(error)}`);
        return false;
      });
      if (reminded) sent += 1;
      else await db.update(offer).set({ reminderSentAt: null }).where(and(eq(offer.id, id), eq(offer.reminderSentAt, now)));
    }
    return sent;
  } catch (error) {
    console.error(`Fitting reminders not sent: ${error instanceof Error ? error.message : String(error)}`);
    return 0;
  }
}

async function remind(db: Database, offerId: number, now: Date): Promise<boolean> {
  const facts = await readOfferFacts(db, offerId);
  if (!facts || !hasFitting(facts)) return false;
  const result = await sendRecordedEmail(db, {
    senderId: null,
    kind: "fitting_reminder",
    reference: String(offerId),
    to: facts.driver.email,
    replyTo: facts.shop.email,
    message: fittingReminderEmail(facts, now),
    idempotencyKey: `fitting-reminder-${offerId}-${facts.fitting.calendarSequence}`,
  });
  return result.ok;
}
