import type { FreeSlot } from "./slot-days";

/** What the shop's server answered to a driver's accept or cancel, in words the page can show. */
export type OfferAnswer =
  | { ok: true; appointment?: FreeSlot }
  | { ok: false; code: string; message: string; nextSlots: FreeSlot[]; gone: boolean };

const UNREACHABLE = "The shop's server could not be reached. Check the connection and try again, or call the shop.";

async function postOffer(token: string, action: "accept" | "cancel", body: object): Promise<OfferAnswer> {
  try {
    const response = await fetch(`/api/v1/offers/${encodeURIComponent(token)}/${action}`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    const answer = (await response.json().catch(() => null)) as {
      appointment?: FreeSlot;
      error?: { code?: string; message?: string; nextSlots?: FreeSlot[] };
    } | null;
    if (response.ok) return { ok: true, appointment: answer?.appointment };
    return {
      ok: false,
      code: answer?.error?.code ?? "error",
      message: answer?.error?.message ?? `The shop's server could not ${action} this offer just now. Try again, or call the shop.`,
      nextSlots: answer?.error?.nextSlots ?? [],
      gone: response.status === 410 || response.status === 404,
    };
  } catch {
    return { ok: false, code: "unreachable", message: UNREACHABLE, nextSlots: [], gone: false };
  }
}

/** POST …/accept with one of the free starts. */
export const acceptOfferAt = (token: string, slotStart: string) => postOffer(token, "accept", { slotStart });

/** POST …/cancel: the driver cancels the booked fitting. */
export const cancelFitting = (token: string) => postOffer(token, "cancel", {});

/** GET …/slots from a day; throws an Error with the server's words when it refuses. */
export async function fetchFreeSlots(url: string): Promise<{ timeZone: string; slots: FreeSlot[] }> {
  const response = await fetch(url, { cache: "no-store" }).catch(() => null);
  if (!response) throw new Error(UNREACHABLE);
  const answer = (await response.json().catch(() => null)) as { slots?: FreeSlot[]; timeZone?: string; error?: { message?: string } } | null;
  if (!response.ok || !answer?.slots) throw new Error(answer?.error?.message ?? "The free times could not be read just now. Try again, or call the shop.");
  return { timeZone: answer.timeZone ?? "", slots: answer.slots };
}
