import { connection } from "next/server";
import { getDb } from "@/db/client";
import { getShopContact } from "@/lib/shop/queries";

export async function ShopContactLine() {
  await connection();
  const contact = await getShopContact(await getDb()).catch(() => null);
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
