import type { Database } from "@/db/client";
import { sendFittingBookedEmails, sendFittingCancelledEmails, sendOfferEmail } from "./offer-emails";

/**
 * The e-mails that follow an offer's changes, sent once the change has committed: a failure is
 * recorded in the outbox and never undoes the change. Each answers whether its e-mails went out.
 */
export const notifyOfferSent = async (db: Database, offerId: number): Promise<boolean> => (await sendOfferEmail(db, offerId)).ok;

export const notifyFittingBooked = async (db: Database, offerId: number): Promise<boolean> => (await sendFittingBookedEmails(db, offerId)).ok;

/** After the driver or staff cancel: the calendar's CANCEL under the same UID, its SEQUENCE raised by the cancelling write. */
export const notifyFittingCancelled = async (db: Database, offerId: number): Promise<boolean> => (await sendFittingCancelledEmails(db, offerId)).ok;
