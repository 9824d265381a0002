import type { ShopContact } from "@/lib/shop/queries";

/** The shop's address, phone and hours, one line in the footer. */
export function ShopContactLine({ contact }: { contact: ShopContact | null }) {
  if (!contact) return null;
  return (
    <address className="not-italic">
      <span className="font-semibold text-ink">{contact.name}</span> · {contact.streetAddress}, {contact.town},{" "}
      {contact.region} {contact.postalCode} ·{" "}
      <a className="underline" href={`tel:${contact.phone.replace(/[^\d+]/g, "")}`}>
        {contact.phone}
      </a>{" "}
      · {contact.openingHours}
    </address>
  );
}
