import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { readShopSettings, SHOP_NOT_SET_UP, updateShopSettings } from "@/lib/shop/settings";
import { expireShopCache } from "@/lib/shop/shop-cache";
import { shopSettingsChangesSchema } from "@/lib/shop/settings-schema";

/** The shop's contact, time zone, hours, default tolerance and charges → 200; anyone may read them. */
export const GET = withRoute({ role: "public" }, async ({ db }) => {
  const settings = await readShopSettings(db);
  return settings ? NextResponse.json(settings) : apiError("not_found", SHOP_NOT_SET_UP);
});

/** Admins change any of the settings → 200 with all of them; the change is audited with it. */
export const PATCH = withRoute({ role: "admin", body: shopSettingsChangesSchema }, async ({ db, user, body }) => {
  const result = await updateShopSettings(db, user, body);
  // After the change has committed: the footer of every page, and the finder's defaults, are read again.
  if (result.ok && result.changes.length > 0) expireShopCache();
  return result.ok ? NextResponse.json(result.settings) : apiError(result.code, result.message);
});
