import { PhoneLink } from "@/components/ui/phone-link";
import type { ShopContact } from "@/lib/shop/queries";

/** Where to go with the card: the shop's address, phone, e-mail and hours. */
export function ShopCard({ shop }: { shop: ShopContact }) {
  return (
    <section aria-labelledby="shop-heading" className="rounded border border-rule bg-sheet p-4 print:break-inside-avoid">
      <h2 id="shop-heading" className="font-semibold">
        {shop.name}
      </h2>
      <address className="mt-1 not-italic">
        {shop.streetAddress}, {shop.town}, {shop.region} {shop.postalCode}
        <br />
        <PhoneLink phone={shop.phone} />{" "}
        ·{" "}
        <a className="underline" href={`mailto:${shop.email}`}>
          {shop.email}
        </a>
        <br />
        {shop.openingHours}
      </address>
    </section>
  );
}
