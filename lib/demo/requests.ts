import { and, asc, count, eq, gte } from "drizzle-orm";
import type { Database } from "@/db/client";
import { quoteRequest, quoteRequestTire, stockItem, user, type QuoteSource, type QuoteStatus } from "@/db/schema";
import { addLocalDays, todayIn } from "@/lib/fittings";
import { acceptOffer } from "@/lib/offers/accept-offer";
import { createOffer } from "@/lib/offers/create-offer";
import { freeSlotsWith } from "@/lib/offers/offer-slots";
import { readShopSettings } from "@/lib/shop/settings";

/** Invented drivers (555-01xx numbers are reserved for fiction) and what each asked. */
const DEMO_REQUESTS: { name: string; email: string; phone?: string; vehicle: string; source: QuoteSource; status: QuoteStatus; tires: string; offer?: "open" | "booked" }[] = [
  { name: "Priya Oduya", email: "priya.oduya@example.test", phone: "(555) 014-7731", vehicle: "2020 midsize SUV", source: "finder", status: "new", tires: "Replacing 225/65R17 102H" },
  { name: "Tomas Reddick", email: "tomas.reddick@example.test", vehicle: "2017 crossover", source: "finder", status: "new", tires: "Replacing 225/65R17 102H", offer: "open" },
  { name: "Hana Lindqvist", email: "hana.lindqvist@example.test", phone: "(555) 014-2208", vehicle: "2019 family SUV", source: "finder", status: "new", tires: "Replacing 225/65R17 102H", offer: "booked" },
  { name: "Wes Achterberg", email: "wes.achterberg@example.test", phone: "(555) 014-6650", vehicle: "2016 wagon", source: "counter", status: "new", tires: "225/65R17 102H", offer: "booked" },
  { name: "Ines Carvalho", email: "ines.carvalho@example.test", vehicle: "Utility trailer", source: "size-sheet", status: "answered", tires: "Two ST225/75R15 for a utility trailer" },
];

/**
 * A few requests on the demo shop, one answered with an open offer and two with fittings booked on
 * the first day with free times, so that the inbox and the day's fittings are not empty. Prices
 * and times come from the shop as seeded and the clock now. Runs once: a database with requests is
 * left alone.
 */
export async function seedDemoRequestsIfEmpty(db: Database, now = new Date()): Promise<void> {
  const [existing] = await db.select({ requests: count() }).from(quoteRequest);
  if ((existing?.requests ?? 0) > 0) return;
  const [staff] = await db.select({ id: user.id, email: user.email }).from(user).where(eq(user.email, "staff@sidewise.test"));
  const settings = await readShopSettings(db);
  if (!staff || !settings) return;
  // Tires the shop has plenty of, so that the holds leave sets for everyone else.
  const tires = await db
    .select({ id: stockItem.id, sku: stockItem.sku })
    .from(stockItem)
    .where(and(eq(stockItem.designation, "225/65R17"), eq(stockItem.retired, false), gte(stockItem.quantityOnHand, 12)))
    .orderBy(asc(stockItem.sku))
    .limit(2);
  if (tires.length === 0) return;
  const firstFreeDay = (await freeSlotsWith(db, settings, { from: addLocalDays(todayIn(settings.timeZone, now), 1), now }))[0];

  for (const [index, { offer: offered, ...request }] of DEMO_REQUESTS.entries()) {
    const tire = tires[index % tires.length]!;
    const [row] = await db.insert(quoteRequest).values({ ...request, quantity: 4 }).returning({ id: quoteRequest.id });
    if (request.source === "finder") await db.insert(quoteRequestTire).values({ requestId: row!.id, position: 0, stockItemId: tire.id });
    if (!offered) continue;
    const message = offered === "open" ? "These are in stock now; fitting and balancing included. Reply or call with any question." : "";
    const sent = await createOffer(db, staff, row!.id, { lines: [{ sku: tire.sku, quantity: 4 }], message }, now);
    if (sent.ok && offered === "booked" && firstFreeDay) await acceptOffer(db, sent.offer.token, firstFreeDay.start, now);
  }
}
