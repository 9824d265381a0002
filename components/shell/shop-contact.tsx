import { PhoneLink } from "@/components/ui/phone-link";
import type { ShopContact } from "@/lib/shop/queries";

/** The shop's address, phone and hours, one line in the footer. */
export function ShopContactLine({ contact }: { contact: ShopContact | null }) {
  if (!contact) return null;
  return (
    <address className="not-italic">
      <span className="font-semibold text-ink">{contact.name}</span> · {contact.streetAddress}, {contact.town},{" "}
      {contact.region} {contact.postalCode} ·{" "}
      <PhoneLink phone={contact.phone} />{" "}
      · {contact.openingHours}
    </address>
  );
}
