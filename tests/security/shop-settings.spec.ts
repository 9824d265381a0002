import type { APIRequestContext } from "@playwright/test";
import { expect, test } from "@playwright/test";
import { client } from "./http";

// The shop's settings over HTTP against the production build. Other specs read the demo shop from the
// same server, so whatever this file changes is put back in afterAll.
test.describe.configure({ mode: "serial" });

let anonymous: APIRequestContext;
let staff: APIRequestContext;
let admin: APIRequestContext;
let original: Record<string, unknown>;

test.beforeAll(async ({ baseURL }) => {
  [anonymous, staff, admin] = await Promise.all([client(baseURL!), client(baseURL!, "staff@sidewise.test"), client(baseURL!, "admin@sidewise.test")]);
  original = await (await anonymous.get("/api/v1/shop")).json();
});

test.afterAll(async () => {
  if (original) {
    const restored = await admin.patch("/api/v1/shop", { data: original });
    expect(restored.status(), "the demo shop's settings are put back").toBe(200);
    expect(await restored.json()).toEqual(original);
  }
  await Promise.all([anonymous, staff, admin].map((context) => context?.dispose()));
});

test("anyone reads the shop's settings", async () => {
  const response = await anonymous.get("/api/v1/shop");
  expect(response.status()).toBe(200);
  expect(response.headers()["content-type"]).toContain("application/json");
  expect(await response.json()).toMatchObject({
    name: "Marrowby Tire Works",
    address: { town: "Halvering", region: "OH" },
    timeZone: "America/New_York",
    hours: { sun: [] },
    tolerancePct: 3,
    taxRateBp: 725,
    taxServices: true,
  });
});

test("an admin changes some settings and reads them back; the others stay", async () => {
  const changed = await admin.patch("/api/v1/shop", { data: { tireFeePerTireCents: 150, address: { postalCode: "43998" }, hours: { sun: [["10:00", "14:00"]] } } });
  expect(changed.status()).toBe(200);
  const readBack = await (await anonymous.get("/api/v1/shop")).json();
  expect(readBack).toEqual(await changed.json());
  expect(readBack).toMatchObject({ tireFeePerTireCents: 150, address: { postalCode: "43998", town: "Halvering" }, hours: { sun: [["10:00", "14:00"]], mon: [["07:30", "18:00"]] }, taxRateBp: 725 });
});

test("staff get 403, anonymous visitors 401, and nothing changes", async () => {
  const byStaff = await staff.patch("/api/v1/shop", { data: { taxRateBp: 0 } });
  expect([byStaff.status(), (await byStaff.json()).error.code]).toEqual([403, "forbidden"]);
  const byNobody = await anonymous.patch("/api/v1/shop", { data: { taxRateBp: 0 } });
  expect([byNobody.status(), (await byNobody.json()).error.code]).toEqual([401, "unauthenticated"]);
  expect((await (await anonymous.get("/api/v1/shop")).json()).taxRateBp).toBe(725);
});

test("bad values get a 400 naming the field and saying what to do", async () => {
  const cases: [unknown, string, RegExp][] = [
    [{ timeZone: "Mars/Olympus" }, "timeZone", /IANA time zone name/],
    [{ hours: { sat: [["12:00", "08:00"]] } }, "hours.sat.0", /closes before it opens/],
    [{ closedDates: ["2026-02-30"] }, "closedDates.0", /not a date in the calendar/],
    [{ taxRateBp: 7.25 }, "taxRateBp", /725 for 7\.25 %/],
    [{ fittingPerTireCents: -100 }, "fittingPerTireCents", /whole cents/],
    [{ colour: "black" }, "colour", /not a setting of the shop/],
  ];
  for (const [data, field, message] of cases) {
    const response = await admin.patch("/api/v1/shop", { data });
    const { error } = await response.json();
    expect([response.status(), error.code, error.field], JSON.stringify(data)).toEqual([400, "invalid_parameter", field]);
    expect(error.message).toMatch(message);
  }
  const foreign = await admin.patch("/api/v1/shop", { headers: { origin: "http://localhost:1" }, data: { taxRateBp: 0 } });
  expect(foreign.status()).toBe(403);
});
