import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { DELETE as withdraw, GET as getCard } from "@/app/api/v1/fit-cards/[slug]/route";
import { POST as saveCard } from "@/app/api/v1/fit-cards/route";
import { stockItem } from "@/db/schema";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

let customer = "";
let staff = "";
beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  vi.stubEnv("SITE_URL", "https://shop.example.test");
  await getDb();
  customer = await signIn("customer@sidewise.test", "sidewise-demo");
  staff = await signIn("staff@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

const cardAt = (slug: string) => callRoute(getCard, "GET", `/api/v1/fit-cards/${slug}`, { params: { slug } });

describe("a Fit card through the API", () => {
  it("is saved by a signed-in driver, read by anyone with the link, and withdrawn by staff", async () => {
    const [tire] = await (await getDb())
      .select({ sku: stockItem.sku })
      .from(stockItem)
      .where(and(eq(stockItem.designation, "225/45R17"), eq(stockItem.retired, false)))
      .limit(1);
    if (!tire) throw new Error("the demo catalog has no 225/45R17");
    const saved = await callRoute(saveCard, "POST", "/api/v1/fit-cards", {
      cookie: customer,
      body: { sizes: ["225/45R17", "225/40R18"], skus: [tire.sku], loadIndex: 91, speedSymbol: "V", note: "For the blue hatchback" },
    });
    expect(saved.status).toBe(201);
    const { slug, url } = await saved.json();
    expect(url).toBe(`https://shop.example.test/s/${slug}`);
    expect(saved.headers.get("location")).toBe(url);

    const shown = await cardAt(slug);
    expect(shown.status).toBe(200);
    const card = await shown.json();
    expect(card).toMatchObject({ slug, sizes: ["225/45R17", "225/40R18"], note: "For the blue hatchback", original: { designation: "225/45R17", loadIndex: 91 } });
    expect(card.tires.map((chosen: { sku: string }) => chosen.sku)).toEqual([tire.sku]);

    expect((await callRoute(withdraw, "DELETE", `/api/v1/fit-cards/${slug}`, { cookie: staff, params: { slug } })).status).toBe(204);
    const gone = await cardAt(slug);
    expect(gone.status).toBe(410);
    expect((await gone.json()).error.code).toBe("gone");
  });

  it("answers 404 for a link that leads to no card", async () => {
    const unknown = await cardAt("N".repeat(24));
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.code).toBe("not_found");
  });
});
