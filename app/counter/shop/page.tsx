import type { Metadata } from "next";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { ShopSettingsForm } from "@/components/counter/shop-settings-form";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { readShopSettings, SHOP_NOT_SET_UP } from "@/lib/shop/settings";
import { listTimeZones } from "@/lib/shop/time-zone";

export const metadata: Metadata = { title: "Shop settings · Counter", robots: { index: false } };

export default async function ShopSettingsPage() {
  const access = await requirePageUser("/counter/shop", "admin");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="admin" why="Only an admin can change the shop's settings." />;
  const settings = await readShopSettings(await getDb());
  return (
    <section>
      <PageIntro eyebrow="Counter · Admin" title="Shop settings">
        <p>
          The shop&apos;s contact and hours (shown in every page&apos;s footer and on Fit cards), its time zone (every time in the Counter is written in it),
          the finder&apos;s default tolerance, what a set costs beyond the tires and how drivers book fittings.
        </p>
      </PageIntro>
      {settings ? <ShopSettingsForm initial={settings} timeZones={listTimeZones()} /> : <p role="alert">{SHOP_NOT_SET_UP}</p>}
    </section>
  );
}
