import { type EmailBlock, type EmailMessage, paragraph } from "@/lib/email/email-message";
import { addressLine } from "@/lib/shop/address";
import type { ShopContact } from "@/lib/shop/queries";

/** The request as the e-mails tell it: only what the driver typed, never internal data. */
export interface RequestSummary {
  id: number;
  name: string;
  email: string;
  phone: string | null;
  vehicle: string;
  tires: string;
  quantity: number;
  preferredDay: string | null;
}

function summaryRows(request: RequestSummary): [string, string][] {
  return [
    ["Name", request.name],
    ["E-mail", request.email],
    ["Phone", request.phone ?? "not given"],
    ["Vehicle", request.vehicle],
    ["Tires", request.tires],
    ["How many", String(request.quantity)],
    ["Preferred day", request.preferredDay ?? "no preference"],
  ];
}

function shopBlock(shop: ShopContact | null): EmailBlock[] {
  if (!shop) return [];
  return [paragraph(shop.name, addressLine(shop), `Phone ${shop.phone} · ${shop.email}`, shop.openingHours)];
}

/** To the shop: a new request; replying to the e-mail reaches the driver. */
export function requestToShopEmail(request: RequestSummary, counterUrl: string): EmailMessage {
  return {
    subject: `Price request #${request.id}: ${request.quantity} × ${request.tires.slice(0, 60)}`,
    blocks: [
      paragraph(`${request.name} asks for a price through Sidewise.`),
      { kind: "fields", rows: summaryRows(request) },
      paragraph(`Reply to this e-mail to write to ${request.name} directly, or answer in the Counter so the reply is kept with the request:`),
      { kind: "button", label: "Answer in the Counter", href: counterUrl },
    ],
  };
}

/**
 * To the driver: we have it, and what happens next. Anyone can type someone else's address into the
 * form, so this e-mail carries nothing the sender wrote (not even the name): only the number, the
 * quantity, the day picked and the shop's own words.
 */
export function requestConfirmationEmail(request: Pick<RequestSummary, "id" | "quantity" | "preferredDay">, shop: ShopContact | null): EmailMessage {
  const shopName = shop?.name ?? "The shop";
  return {
    subject: `We have your price request (#${request.id})`,
    blocks: [
      paragraph("Hello,"),
      paragraph(
        `Thank you for asking. ${shopName} has your request #${request.id} for a price on ${request.quantity} ${request.quantity === 1 ? "tire" : "tires"}${
          request.preferredDay ? `, fitted on ${request.preferredDay} if you book` : ""
        }, and will answer at this address, usually within one working day.`,
      ),
      paragraph(
        "A price depends on the tires in stock on the day; the shop confirms it when you book the fitting. If you did not ask for a price, ignore this e-mail: nothing is booked and no one will write again unless you reply.",
      ),
      ...shopBlock(shop),
    ],
  };
}

/** To the driver: the shop's answer, in the staff member's words. */
export function quoteReplyEmail(request: RequestSummary, reply: { body: string; authorName: string }, shop: ShopContact | null): EmailMessage {
  return {
    subject: `About your price request (#${request.id})`,
    blocks: [
      paragraph(`Hello ${request.name},`),
      paragraph(...reply.body.split("\n")),
      paragraph(`${reply.authorName}${shop ? `, ${shop.name}` : ""}`),
      paragraph(`You asked about: ${request.quantity} × ${request.tires}, for ${request.vehicle}.`),
      ...shopBlock(shop),
    ],
  };
}
