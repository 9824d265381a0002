import { desc, eq } from "drizzle-orm";
import { revalidateTag } from "next/cache";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { GET, PATCH } from "@/app/api/v1/shop/route";
import { auditEvent, shop } from "@/db/schema";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { demoShop } from "@/lib/demo/shop";
import { SHOP_CACHE_TAG } from "@/lib/shop/shop-cache";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

const cookies = { customer: "", staff: "", admin: "" };

const read = async () => {
  const response = await callRoute(GET, "GET", "/api/v1/shop");
  return { status: response.status, body: await response.json() };
};
const change = async (body: unknown, cookie = cookies.admin) => {
  const response = await callRoute(PATCH, "PATCH", "/api/v1/shop", { cookie, body });
  return { status: response.status, body: await response.json() };
};
const shopAudits = async () => (await getDb()).select().from(auditEvent).where(eq(auditEvent.action, "shop_changed")).orderBy(desc(auditEvent.id));

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  for (const role of ["customer", "staff", "admin"] as const) cookies[role] = await signIn(`${role}@sidewise.test`, "sidewise-demo");
});
// Only the shop row and its audit entries change here: put the demo shop back as it was.
beforeEach(async () => {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(shop);
    await tx.insert(shop).values(demoShop);
    await tx.delete(auditEvent).where(eq(auditEvent.action, "shop_changed"));
  });
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("GET /api/v1/shop", () => {
  it("answers anyone with the demo shop's settings, the address as an object", async () => {
    const { status, body } = await read();
    expect(status).toBe(200);
    expect(body).toEqual({
      name: demoShop.name,
      address: { streetAddress: demoShop.streetAddress, town: demoShop.town, region: demoShop.region, postalCode: demoShop.postalCode },
      phone: demoShop.phone,
      email: demoShop.email,
      timeZone: "America/New_York",
      hours: demoShop.hours,
      closedDates: ["2026-12-25", "2027-01-01"],
      tolerancePct: 3,
      fittingPerTireCents: 2_500,
      disposalPerTireCents: 400,
      tireFeePerTireCents: 100,
      taxRateBp: 725,
      taxServices: true,
      fittingBays: 2,
      fittingMinutes: 60,
      leadMinutes: 120,
      cancelCutoffHours: 24,
      wearLimit32: 2,
    });
  });

  it("answers 404 before the shop is set up", async () => {
    await (await getDb()).delete(shop);
    const { status, body } = await read();
    expect([status, body.error.code]).toEqual([404, "not_found"]);
  });
});

describe("PATCH /api/v1/shop", () => {
  it("is for admins: anonymous 401, customer and staff 403, and nothing changes", async () => {
    expect((await change({ taxRateBp: 800 }, "")).status).toBe(401);
    expect((await change({ taxRateBp: 800 }, cookies.customer)).status).toBe(403);
    const staff = await change({ taxRateBp: 800 }, cookies.staff);
    expect([staff.status, staff.body.error.code]).toEqual([403, "forbidden"]);
    expect((await read()).body.taxRateBp).toBe(725);
    expect(await shopAudits()).toEqual([]);
  });

  it("changes only what it names (a part of the address, one day), answers every setting and audits before and after", async () => {
    const { status, body } = await change({ taxRateBp: 800, address: { town: "Upper Halvering" }, hours: { sat: [["08:00", "12:00"], ["13:00", "16:00"]] } });
    expect(status).toBe(200);
    expect(body.taxRateBp).toBe(800);
    expect(body.address).toEqual({ streetAddress: demoShop.streetAddress, town: "Upper Halvering", region: "OH", postalCode: "43999" });
    expect(body.hours.sat).toEqual([["08:00", "12:00"], ["13:00", "16:00"]]);
    expect(body.hours.mon).toEqual([["07:30", "18:00"]]);
    expect(body).toMatchObject({ name: demoShop.name, fittingPerTireCents: 2_500, taxServices: true, closedDates: ["2026-12-25", "2027-01-01"] });
    expect((await read()).body).toEqual(body);

    const [audit, ...older] = await shopAudits();
    expect(older).toEqual([]);
    expect(audit).toMatchObject({ actorEmail: "admin@sidewise.test", subject: demoShop.name });
    expect(audit?.changes).toEqual({
      "address.town": { from: "Halvering", to: "Upper Halvering" },
      "hours.sat": { from: [["08:00", "14:00"]], to: [["08:00", "12:00"], ["13:00", "16:00"]] },
      taxRateBp: { from: 725, to: 800 },
    });
    expect(audit?.summary).toBe("Town “Halvering” → “Upper Halvering”; Saturday 08:00–14:00 → 08:00–12:00, 13:00–16:00; tax rate 7.25 % → 8 %");
  });

  it("expires the shop's cache (the footer's contact, the finder's defaults) once a change has been written, and only then", async () => {
    vi.mocked(revalidateTag).mockClear();
    expect((await change({ phone: "(555) 014-7788" })).status).toBe(200);
    expect(vi.mocked(revalidateTag).mock.calls).toEqual([[SHOP_CACHE_TAG, { expire: 0 }]]);

    vi.mocked(revalidateTag).mockClear();
    expect((await change({ phone: "(555) 014-7788" })).status).toBe(200);
    expect((await change({ phone: "call us" })).status).toBe(400);
    expect((await change({ taxRateBp: 800 }, cookies.staff)).status).toBe(403);
    expect(vi.mocked(revalidateTag), "a change of nothing, a refused change: nothing to expire").not.toHaveBeenCalled();
  });

  it("keeps closed dates in order, takes UTC and IANA names ICU lists under an older spelling, and audits nothing for no change", async () => {
    expect((await change({ closedDates: ["2027-01-01", "2026-11-26", "2026-12-25"] })).body.closedDates).toEqual(["2026-11-26", "2026-12-25", "2027-01-01"]);
    expect((await change({ timeZone: "UTC" })).body.timeZone).toBe("UTC");
    expect((await change({ timeZone: "Asia/Kolkata" })).body.timeZone).toBe("Asia/Kolkata");
    const audits = (await shopAudits()).length;
    const same = await change({ timeZone: "Asia/Kolkata", taxServices: true });
    expect(same.status).toBe(200);
    expect((await shopAudits()).length).toBe(audits);
  });

  it.each([
    [{}, "body"],
    [{ colour: "black" }, "colour"],
    [{ taxRateBp: 800, colour: "black" }, "colour"],
    [{ address: { town: "X", zip: "1" } }, "address.zip"],
    [{ address: {} }, "address"],
    [{ address: { town: "  " } }, "address.town"],
    [{ name: "" }, "name"],
    [{ name: "x".repeat(101) }, "name"],
    [{ phone: "call us" }, "phone"],
    [{ email: "counter" }, "email"],
    [{ timeZone: "Mars/Olympus" }, "timeZone"],
    [{ timeZone: "america/new_york" }, "timeZone"],
    [{ timeZone: "EST" }, "timeZone"],
    [{ timeZone: "+05:00" }, "timeZone"],
    [{ hours: {} }, "hours"],
    [{ hours: { funday: [] } }, "hours.funday"],
    [{ hours: { sat: "08:00-12:00" } }, "hours.sat"],
    [{ hours: { sat: [["08:00"]] } }, "hours.sat.0"],
    [{ hours: { sat: [["8:00", "12:00"]] } }, "hours.sat.0.0"],
    [{ hours: { sat: [["08:00", "24:01"]] } }, "hours.sat.0.1"],
    [{ hours: { sat: [["12:00", "08:00"]] } }, "hours.sat.0"],
    [{ hours: { sat: [["08:00", "08:00"]] } }, "hours.sat.0"],
    [{ hours: { sat: [["13:00", "16:00"], ["08:00", "12:00"]] } }, "hours.sat.1"],
    [{ hours: { sat: [["08:00", "12:00"], ["11:30", "16:00"]] } }, "hours.sat.1"],
    [{ hours: { sat: [["08:00", "12:00"], ["12:00", "16:00"]] } }, "hours.sat.1"],
    [{ hours: { sat: [["06:00", "07:00"], ["08:00", "09:00"], ["10:00", "11:00"], ["12:00", "13:00"], ["14:00", "15:00"]] } }, "hours.sat.4"],
    [{ closedDates: "2026-12-25" }, "closedDates"],
    [{ closedDates: ["2026-02-30"] }, "closedDates.0"],
    [{ closedDates: ["2026-12-25", "25/12/2026"] }, "closedDates.1"],
    [{ closedDates: ["2026-12-25", "2026-12-25"] }, "closedDates.1"],
    [{ closedDates: ["1999-12-31"] }, "closedDates.0"],
    [{ closedDates: Array.from({ length: 101 }, (_, day) => new Date(Date.UTC(2027, 0, 1 + day)).toISOString().slice(0, 10)) }, "closedDates"],
    [{ tolerancePct: 0.5 }, "tolerancePct"],
    [{ tolerancePct: 5.5 }, "tolerancePct"],
    [{ tolerancePct: "3" }, "tolerancePct"],
    [{ fittingPerTireCents: -1 }, "fittingPerTireCents"],
    [{ disposalPerTireCents: 4.5 }, "disposalPerTireCents"],
    [{ tireFeePerTireCents: 100_001 }, "tireFeePerTireCents"],
    [{ taxRateBp: 7.25 }, "taxRateBp"],
    [{ taxRateBp: 10_001 }, "taxRateBp"],
    [{ taxServices: "yes" }, "taxServices"],
  ])("refuses %j with 400 invalid_parameter naming %s, saying what to do, and changes nothing", async (body, field) => {
    const { status, body: answer } = await change(body);
    expect(status).toBe(400);
    expect(answer.error).toMatchObject({ code: "invalid_parameter", field });
    expect(answer.error.message).toMatch(new RegExp(`^The field "${field.replace(/\./g, "\\.")}" is invalid: .{20,}\\.$`));
    expect((await read()).body.taxRateBp).toBe(725);
    expect(await shopAudits()).toEqual([]);
  });

  it("names the unknown field and lists the settings it takes", async () => {
    const { body } = await change({ colour: "black" });
    expect(body.error.message).toBe(
      'The field "colour" is invalid: not a setting of the shop: remove it (the settings are name, address, phone, email, timeZone, hours, closedDates, tolerancePct, fittingPerTireCents, disposalPerTireCents, tireFeePerTireCents, taxRateBp, taxServices, fittingBays, fittingMinutes, leadMinutes, cancelCutoffHours, wearLimit32).',
    );
  });

  it("answers 404 when there is no shop to change", async () => {
    await (await getDb()).delete(shop);
    const { status, body } = await change({ taxRateBp: 800 });
    expect([status, body.error.code]).toEqual([404, "not_found"]);
  });
});
