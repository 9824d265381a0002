import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { PATCH as patchBrand } from "@/app/api/v1/brands/[id]/route";
import { POST as postLine } from "@/app/api/v1/brands/[id]/lines/route";
import { GET as getBrands, POST as postBrand } from "@/app/api/v1/brands/route";
import { PATCH as patchLine } from "@/app/api/v1/lines/[id]/route";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { PATCH as patchItem } from "@/app/api/v1/catalog/[sku]/route";
import { POST as importCatalog } from "@/app/api/v1/catalog/import/route";
import { POST as postItem } from "@/app/api/v1/catalog/route";
import { NextRequest } from "next/server";
import { writeCatalogCsv } from "@/lib/catalog-csv/write-file";
import { APP_ORIGIN } from "../helpers/auth-session";
import { checkContract } from "../helpers/contract";
import { auditEvent } from "@/db/schema";
import type { AuditAction } from "@/lib/tire";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

const cookies: Record<"staff" | "admin" | "customer", string> = { staff: "", admin: "", customer: "" };
type Caller = keyof typeof cookies | "anonymous";

async function send(handler: Parameters<typeof callRoute>[0], method: string, path: string, body?: unknown, as: Caller = "staff", params?: Record<string, string>) {
  const response = await callRoute(handler, method, path, { cookie: as === "anonymous" ? undefined : cookies[as], body, params });
  return { status: response.status, body: await response.json() };
}
const addBrand = (body: unknown, as?: Caller) => send(postBrand, "POST", "/api/v1/brands", body, as);
const renameBrand = (id: number | string, body: unknown, as?: Caller) => send(patchBrand, "PATCH", `/api/v1/brands/${id}`, body, as, { id: String(id) });
const addLine = (brandId: number | string, body: unknown, as?: Caller) => send(postLine, "POST", `/api/v1/brands/${brandId}/lines`, body, as, { id: String(brandId) });
const changeLine = (id: number | string, body: unknown, as?: Caller) => send(patchLine, "PATCH", `/api/v1/lines/${id}`, body, as, { id: String(id) });
const listBrands = async () => (await send(getBrands, "GET", "/api/v1/brands", undefined, "anonymous")).body.brands as { id: number; name: string; lines: { id: number; name: string }[] }[];
const audits = async (action: AuditAction) => (await getDb()).select().from(auditEvent).where(eq(auditEvent.action, action));

const trail = { name: "Hollin Trail", season: "all-season", terrain: "all-terrain", threePeak: true, treadDepth32: 15 };

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  for (const who of ["staff", "admin", "customer"] as const) cookies[who] = await signIn(`${who}@sidewise.test`, "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("GET /api/v1/brands", () => {
  it("lists every brand with its lines to anyone, brands and lines in name order", async () => {
    const brands = await listBrands();
    const names = brands.map((brand) => brand.name);
    expect(names).toEqual([...names].sort((a, b) => (a.toLowerCase() < b.toLowerCase() ? -1 : 1)));
    const quensal = brands.find((brand) => brand.name === "Quensal");
    expect(quensal?.lines.map((line) => line.name)).toEqual(["Aldermoor AW", "Aldermoor Tour", "Bexford AT", "Bexford HT", "Caddon MT"]);
    expect(quensal?.lines[1]).toEqual({ id: expect.any(Number), name: "Aldermoor Tour", season: "all-season", terrain: "highway", threePeak: false, treadDepth32: expect.any(Number), retired: false });
  });
});

describe("brands", () => {
  let id = 0;

  it("adds a brand for staff, trimmed, answered 201 and audited", async () => {
    const { status, body } = await addBrand({ name: "  Lumbrel   Works " });
    expect(status).toBe(201);
    expect(body).toEqual({ id: expect.any(Number), name: "Lumbrel Works" });
    id = body.id;
    expect(await audits("brand_added")).toEqual([expect.objectContaining({ subject: "Lumbrel Works", summary: "Added the brand Lumbrel Works", actorEmail: "staff@sidewise.test" })]);
    expect((await listBrands()).find((brand) => brand.id === id)).toEqual({ id, name: "Lumbrel Works", lines: [] });
  });

  it("refuses a name another brand has, in any letter case, with 409 from the database's unique index", async () => {
    for (const name of ["LUMBREL WORKS", "quensal"]) {
      const { status, body } = await addBrand({ name });
      expect(status).toBe(409);
      expect(body.error).toMatchObject({ code: "already_exists", field: "name" });
    }
    expect((await addBrand({ name: "quensal" })).body.error.message).toBe("Another brand is already called “Quensal”. Brand names are compared without letter case.");
    expect(await audits("brand_added")).toHaveLength(1);
  });

  it.each([
    [{}, "missing_parameter", "name"],
    [{ name: "" }, "invalid_parameter", "name"],
    [{ name: "   " }, "invalid_parameter", "name"],
    [{ name: "x".repeat(41) }, "invalid_parameter", "name"],
    [{ name: "---" }, "invalid_parameter", "name"],
    [{ name: "Tab\tName" }, "invalid_parameter", "name"],
    [{ name: 7 }, "invalid_parameter", "name"],
    [{ name: "Fine", colour: "red" }, "invalid_parameter", "body"],
  ])("refuses %j with 400 %s naming %s", async (body, code, field) => {
    const { status, body: answer } = await addBrand(body);
    expect([status, answer.error.code, answer.error.field]).toEqual([400, code, field]);
  });

  it("renames a brand, audited with the name before and after; its own name in another case is no clash", async () => {
    const { status, body } = await renameBrand(id, { name: "Lumbrel" });
    expect([status, body]).toEqual([200, { id, name: "Lumbrel" }]);
    expect((await renameBrand(id, { name: "LUMBREL" })).status).toBe(200);
    const renamed = await audits("brand_renamed");
    expect(renamed.map((event) => event.summary)).toEqual(["Renamed the brand Lumbrel Works → Lumbrel", "Renamed the brand Lumbrel → LUMBREL"]);
    expect(renamed[0]?.changes).toEqual({ name: { from: "Lumbrel Works", to: "Lumbrel" } });
    expect((await renameBrand(id, { name: "LUMBREL" })).status).toBe(200);
    expect(await audits("brand_renamed")).toHaveLength(2);
  });

  it("refuses a rename onto another brand's name (409), an unknown id (404) and an id that is no number (404)", async () => {
    expect((await renameBrand(id, { name: "QUENSAL" })).body.error).toMatchObject({ code: "already_exists", field: "name" });
    expect((await renameBrand(2_147_483_647, { name: "Nobody" })).body.error.code).toBe("not_found");
    for (const bad of ["abc", "0", "07", "1e3", "99999999999"]) expect((await renameBrand(bad, { name: "Nobody" })).status).toBe(404);
  });

  it("lets only staff and admins write: anonymous 401, customer 403", async () => {
    expect((await addBrand({ name: "Admin Brand" }, "admin")).status).toBe(201);
    for (const [as, status] of [["anonymous", 401], ["customer", 403]] as const) {
      expect((await addBrand({ name: "Refused Brand" }, as)).status).toBe(status);
      expect((await renameBrand(id, { name: "Refused Brand" }, as)).status).toBe(status);
      expect((await addLine(id, trail, as)).status).toBe(status);
      expect((await changeLine(1, { retired: true }, as)).status).toBe(status);
    }
    expect((await listBrands()).some((brand) => brand.name === "Refused Brand")).toBe(false);
  });
});

describe("lines", () => {
  let brandId = 0;
  let lineId = 0;

  beforeAll(async () => {
    brandId = (await addBrand({ name: "Orvelle" })).body.id;
  });

  it("adds a line to a brand, answered 201 and audited; the tread depth may be left out", async () => {
    const { status, body } = await addLine(brandId, trail);
    expect(status).toBe(201);
    expect(body).toEqual({ id: expect.any(Number), brandId, ...trail, retired: false });
    lineId = body.id;
    const plain = await addLine(brandId, { name: " Hollin  Tour ", season: "summer", terrain: "highway", threePeak: false });
    expect(plain.body).toMatchObject({ name: "Hollin Tour", treadDepth32: null });
    expect((await audits("line_added")).map((event) => event.summary)).toEqual([
      "Added the line Orvelle Hollin Trail: all-season, all-terrain, 3PMSF, tread depth 15/32 in",
      "Added the line Orvelle Hollin Tour: summer, highway, tread depth unknown",
    ]);
    expect((await listBrands()).find((brand) => brand.id === brandId)?.lines.map((line) => line.name)).toEqual(["Hollin Tour", "Hollin Trail"]);
  });

  it("refuses a name the brand has in any case (409) but takes it in another brand", async () => {
    const clash = await addLine(brandId, { ...trail, name: "HOLLIN TRAIL" });
    expect([clash.status, clash.body.error.field]).toEqual([409, "name"]);
    expect(clash.body.error.message).toBe("The brand Orvelle already has a line called “Hollin Trail”. Line names are compared without letter case.");
    const quensal = (await listBrands()).find((brand) => brand.name === "Quensal")!;
    expect((await addLine(quensal.id, trail)).status).toBe(201);
  });

  it.each([
    [{ ...trail, season: "spring" }, "season"],
    [{ ...trail, terrain: "sand" }, "terrain"],
    [{ ...trail, threePeak: "yes" }, "threePeak"],
    // A new tire is about 10/32 to 20/32 in deep (common practice); 1/32 and 41/32 are typing slips.
    [{ ...trail, name: "Depth One", treadDepth32: 1 }, "treadDepth32"],
    [{ ...trail, name: "Depth Big", treadDepth32: 41 }, "treadDepth32"],
    [{ ...trail, name: "Depth Half", treadDepth32: 10.5 }, "treadDepth32"],
    [{ ...trail, name: "x".repeat(61) }, "name"],
  ])("refuses a new line %j with 400 naming %s", async (body, field) => {
    const { status, body: answer } = await addLine(brandId, body);
    expect([status, answer.error.code, answer.error.field]).toEqual([400, "invalid_parameter", field]);
  });

  it("answers an unknown brand with 404", async () => {
    expect((await addLine(2_147_483_647, trail)).body.error.code).toBe("not_found");
  });

  it("changes a line, audited field by field; retires and un-retires it", async () => {
    const changed = await changeLine(lineId, { treadDepth32: 16, threePeak: false });
    expect([changed.status, changed.body]).toEqual([200, { id: lineId, brandId, ...trail, treadDepth32: 16, threePeak: false, retired: false }]);
    expect((await changeLine(lineId, { retired: true })).body.retired).toBe(true);
    expect((await changeLine(lineId, { retired: false })).body.retired).toBe(false);
    expect((await changeLine(lineId, { treadDepth32: null })).body.treadDepth32).toBeNull();
    const events = await (await getDb()).select().from(auditEvent).where(and(eq(auditEvent.action, "line_changed"), eq(auditEvent.subject, "Orvelle Hollin Trail")));
    expect(events.map((event) => event.summary)).toEqual([
      "Changed the line Orvelle Hollin Trail: 3PMSF yes → no; tread depth 15/32 in → 16/32 in",
      "Retired the line Orvelle Hollin Trail",
      "Un-retired the line Orvelle Hollin Trail",
      "Changed the line Orvelle Hollin Trail: tread depth 16/32 in → unknown",
    ]);
    expect(events[1]?.changes).toEqual({ retired: { from: false, to: true } });
  });

  it("refuses a rename onto a sibling's name (409), an unknown line (404) and an empty change (400)", async () => {
    expect((await changeLine(lineId, { name: "hollin tour" })).body.error).toMatchObject({ code: "already_exists", field: "name" });
    expect((await changeLine(2_147_483_647, { retired: true })).status).toBe(404);
    expect((await changeLine(lineId, {})).body.error.code).toBe("invalid_parameter");
    expect((await changeLine(lineId, { brandId: 1 })).body.error.code).toBe("invalid_parameter");
  });
});

describe("a retired line", () => {
  const newItem = { sku: "QNS-RET-1", brand: "Quensal", line: "Aldermoor Tour", designation: "225/65R17", loadIndex: 102, speedSymbol: "H", priceCents: 15_000, quantity: 4 };
  const finderLines = async () => {
    const { body } = await send(getAlternatives, "GET", "/api/v1/alternatives?size=225-65R17&loadIndex=102&speedSymbol=H&brand=Quensal&limit=500", undefined, "anonymous");
    return new Set((body.results as { line: string }[]).map((tire) => tire.line));
  };
  async function importCsv(text: string) {
    const form = new FormData();
    form.append("file", new File([text], "retired.csv", { type: "text/csv" }));
    const request = new NextRequest(`${APP_ORIGIN}/api/v1/catalog/import`, { method: "POST", headers: { origin: APP_ORIGIN, cookie: cookies.staff }, body: form });
    return (await checkContract(request, await importCatalog(request, { params: Promise.resolve({}) }))).json();
  }
  let lineId = 0;
  let heldSku = "";

  beforeAll(async () => {
    lineId = (await listBrands()).find((brand) => brand.name === "Quensal")!.lines.find((line) => line.name === "Aldermoor Tour")!.id;
    expect((await send(postItem, "POST", "/api/v1/catalog", { ...newItem, sku: "QNS-RET-0" })).status).toBe(201);
    heldSku = "QNS-RET-0";
    expect((await changeLine(lineId, { retired: true })).body.retired).toBe(true);
  });
  afterAll(async () => {
    await changeLine(lineId, { retired: false });
  });

  it("takes no new item through the catalog API, naming the line and what to do", async () => {
    const { status, body } = await send(postItem, "POST", "/api/v1/catalog", newItem);
    expect([status, body.error.code, body.error.field]).toEqual([422, "line_retired", "line"]);
    expect(body.error.message).toBe('The line "Quensal Aldermoor Tour" is retired and takes no new items; un-retire it on the Lines page (Counter → Lines), or pick another line.');
  });

  it("takes no new item through the CSV import, yet updates an item it already holds", async () => {
    const items = [
      { ...newItem, sku: heldSku, loadIndexDual: null, loadRange: null, extraLoad: false, priceCents: 14_500 },
      { ...newItem, loadIndexDual: null, loadRange: null, extraLoad: false },
    ];
    const report = await importCsv(writeCatalogCsv(items));
    expect(report).toMatchObject({ added: 0, updated: 1, written: false, refused: [{ line: 3, column: "line", reason: expect.stringContaining("is retired") }] });
  });

  it("keeps its items listed, changeable and offered by the finder: the shop sells through its stock", async () => {
    expect((await send(patchItem, "PATCH", `/api/v1/catalog/${heldSku}`, { quantity: 6 }, "staff", { sku: heldSku })).body).toMatchObject({ line: "Aldermoor Tour", inStock: true });
    expect(await finderLines()).toContain("Aldermoor Tour");
  });

  it("takes new items again once un-retired", async () => {
    expect((await changeLine(lineId, { retired: false })).body.retired).toBe(false);
    expect((await send(postItem, "POST", "/api/v1/catalog", newItem)).status).toBe(201);
  });
});
