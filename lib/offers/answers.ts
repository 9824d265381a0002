import { NextResponse } from "next/server";
import { z } from "zod";
import { apiError } from "@/lib/api/errors";
import { estimateSchema } from "@/lib/shop/charges";
import type { OfferRefusal } from "./refusals";

/** POST …/offers: the offer as sent. */
export const sentOfferSchema = z.object({
  id: z.number().int(),
  token: z.string().describe("The driver's key to the offer: at least 128 random bits, base64url."),
  url: z.string().describe("The driver's page of the offer, e-mailed to them."),
  estimate: estimateSchema.describe("The package out the door, frozen as sent."),
  emailed: z.boolean().describe("Whether the offer's e-mail went out; a failure is listed in the outbox and the offer stands."),
});

const appointmentSchema = z.object({ start: z.string().describe("ISO 8601 with the shop's offset."), end: z.string() });

/** POST …/accept */
export const acceptedSchema = z.object({ status: z.literal("accepted"), appointment: appointmentSchema });

/** POST …/cancel */
export const cancelledSchema = z.object({ status: z.literal("cancelled") });

/** An offer's refusal in the API's error shape, with the next free times where another time may do. */
export const refusalAnswer = (refusal: OfferRefusal): NextResponse =>
  apiError(refusal.code, refusal.message, undefined, undefined, refusal.nextSlots ? { nextSlots: refusal.nextSlots } : undefined);
