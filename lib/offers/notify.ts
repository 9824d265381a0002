import type { Database } from "@/db/client";

/**
 * The e-mails that follow an offer's changes, sent once the change has committed: a failure is
 * recorded in the outbox and never undoes the change. Each answers whether its e-mail went out.
 */
export async function notifyOfferSent(_db: Database, _offerId: number): Promise<boolean> {
  return false;
}

export async function notifyFittingBooked(_db: Database, _offerId: number): Promise<boolean> {
  return false;
}

export async function notifyFittingCancelled(_db: Database, _offerId: number): Promise<boolean> {
  return false;
}
