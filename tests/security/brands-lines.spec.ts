import { expect, test } from "@playwright/test";
import { client, contractOf } from "./http";

// Brands and lines seen from outside, over HTTP against the production build: staff write them,
// anyone reads them, a name in other letters is the same name, and no one else may write.
test("staff add a brand and a line, anyone reads them, a duplicate in another case is refused, others may not write", async ({ baseURL }) => {
  const staff = await client(baseURL!, "staff@sidewise.test");
  const anonymous = await client(baseURL!);
  const customer = await client(baseURL!, "customer@sidewise.test");
  const contract = await contractOf(anonymous);
  const name = `Harrowgate ${Date.now().toString(36)}`;

  const created = await staff.post("/api/v1/brands", { data: { name } });
  expect(created.status()).toBe(201);
  expect(await contract("POST", "/api/v1/brands", created)).toBeNull();
  const brand = await created.json();
  expect(brand).toEqual({ id: expect.any(Number), name });

  const line = { name: "Fellside AT", season: "all-season", terrain: "all-terrain", threePeak: true, treadDepth32: 15 };
  const added = await staff.post(`/api/v1/brands/${brand.id}/lines`, { data: line });
  expect(added.status()).toBe(201);
  const { id: lineId } = await added.json();

  const listed = await anonymous.get("/api/v1/brands");
  expect(listed.status()).toBe(200);
  expect(await contract("GET", "/api/v1/brands", listed)).toBeNull();
  const { brands } = await listed.json();
  expect(brands.find((found: { id: number }) => found.id === brand.id)).toEqual({ id: brand.id, name, lines: [{ id: lineId, ...line, retired: false }] });

  const duplicate = await staff.post("/api/v1/brands", { data: { name: name.toUpperCase() } });
  expect([duplicate.status(), (await duplicate.json()).error]).toEqual([409, expect.objectContaining({ code: "already_exists", field: "name" })]);
  const duplicateLine = await staff.post(`/api/v1/brands/${brand.id}/lines`, { data: { ...line, name: "fellside at" } });
  expect(duplicateLine.status()).toBe(409);

  for (const [who, visitor, status] of [["anonymous", anonymous, 401], ["customer", customer, 403]] as const) {
    expect((await visitor.post("/api/v1/brands", { data: { name: `${name} ${who}` } })).status(), who).toBe(status);
    expect((await visitor.patch(`/api/v1/brands/${brand.id}`, { data: { name: `${name} ${who}` } })).status(), who).toBe(status);
    expect((await visitor.post(`/api/v1/brands/${brand.id}/lines`, { data: { ...line, name: who } })).status(), who).toBe(status);
    expect((await visitor.patch(`/api/v1/lines/${lineId}`, { data: { retired: true } })).status(), who).toBe(status);
  }
  const foreign = await staff.patch(`/api/v1/lines/${lineId}`, { headers: { origin: "http://localhost:1" }, data: { retired: true } });
  expect([foreign.status(), (await foreign.json()).error.code]).toEqual([403, "forbidden"]);

  const retired = await staff.patch(`/api/v1/lines/${lineId}`, { data: { retired: true } });
  expect([retired.status(), (await retired.json()).retired]).toEqual([200, true]);
  const refusedItem = await staff.post("/api/v1/catalog", {
    data: { sku: `HRW-${Date.now().toString(36)}`, brand: name, line: line.name, designation: "LT265/75R16", loadIndex: 123, speedSymbol: "R", loadRange: "E", priceCents: 100, quantity: 1 },
  });
  expect([refusedItem.status(), (await refusedItem.json()).error.code]).toEqual([422, "line_retired"]);
  await Promise.all([staff, anonymous, customer].map((context) => context.dispose()));
});
