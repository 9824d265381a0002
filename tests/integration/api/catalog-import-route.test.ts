import { readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as exportCatalog } from "@/app/api/v1/catalog/export/route";
import { POST as importCatalog } from "@/app/api/v1/catalog/import/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { auditEvent } from "@/db/schema";
import { APP_ORIGIN, callRoute, signIn } from "../helpers/auth-session";
import { checkContract } from "../helpers/contract";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

const template = readFileSync(path.join(process.cwd(), "public", "downloads", "sidewise-catalog-template.csv"));
// Three invented items in lines the demo catalog has, written by a spreadsheet (CRLF).
const sample = readFileSync(path.join(process.cwd(), "tests", "fixtures", "catalog-sample.csv"));
// The first bytes of every PNG file (PNG specification, section 5.2), then a chunk header.
const PNG_BYTES = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
let cookie = "";

async function upload(fields: Record<string, string | File>, headers: Record<string, string> = {}) {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  const request = new NextRequest(`${APP_ORIGIN}/api/v1/catalog/import`, { method: "POST", headers: { origin: APP_ORIGIN, cookie, ...headers }, body: form });
  const response = await checkContract(request, await importCatalog(request, { params: Promise.resolve({}) }));
  return { status: response.status, body: await response.json() };
}
const csvFile = (content: BlobPart, name = "stock.csv", type = "text/csv") => new File([content], name, { type });

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  cookie = await signIn("staff@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("POST /api/v1/catalog/import", () => {
  it("imports the template as it is downloaded without writing anything: it holds no items", async () => {
    expect(await upload({ file: csvFile(template, "template.csv") })).toEqual({
      status: 200,
      body: { added: 0, updated: 0, unchanged: 0, refused: [], written: false },
    });
  });

  it("imports rows into the demo catalog, then finds them unchanged", async () => {
    expect(await upload({ file: csvFile(sample, "sample.csv") })).toEqual({
      status: 200,
      body: { added: 3, updated: 0, unchanged: 0, refused: [], written: true },
    });
    expect(await upload({ file: csvFile(sample, "sample.csv"), mode: "valid-rows" })).toEqual({
      status: 200,
      body: { added: 0, updated: 0, unchanged: 3, refused: [], written: false },
    });
    const audits = await (await getDb()).select().from(auditEvent).where(eq(auditEvent.action, "catalog_import"));
    expect(audits.map((audit) => [audit.subject, audit.actorEmail])).toEqual([["sample.csv", "staff@sidewise.test"]]);
  });

  it("reads a file whose lines end in LF and CRLF alike, behind a byte-order mark, as the same rows", async () => {
    const lines = sample.toString("utf8").trimEnd().split("\r\n");
    const mixed = `\uFEFF${lines[0]}\n${lines[1]}\r\n${lines[2]}\n${lines[3]}\r\n`;
    expect(await upload({ file: csvFile(mixed, "mixed.csv"), mode: "valid-rows" })).toEqual({
      status: 200,
      body: { added: 0, updated: 0, unchanged: 3, refused: [], written: false },
    });
  });

  it("answers refused rows with their line, column and reason, writing nothing by default", async () => {
    const text = sample.toString("utf8").replace("QNS-T0001", "QNS-T0101").replace(",102,", ",999,");
    const { status, body } = await upload({ file: csvFile(text) });
    expect(status).toBe(200);
    expect(body).toEqual({
      added: 0,
      updated: 0,
      unchanged: 2,
      refused: [{ line: 2, column: "load_index", reason: "load index 999 is outside the published table (0–279)" }],
      written: false,
    });
    expect((await upload({ file: csvFile("sku,price\nA,1\n") })).body.refused[0]).toEqual({
      line: 1, column: "brand", reason: "the required column brand is missing from the header row; add it",
    });
  });

  it("refuses a file over 5 MB with 413 too_large, by its size or the declared length", async () => {
    const big = await upload({ file: csvFile(new Uint8Array(5 * 1024 * 1024 + 1).fill(0x41)) });
    expect(big.status).toBe(413);
    expect(big.body.error).toEqual({ code: "too_large", message: "The file is larger than 5 MB: split it into smaller files and import them one by one." });
    expect((await upload({ file: csvFile(template) }, { "content-length": String(6 * 1024 * 1024) })).status).toBe(413);
  });

  it("refuses a picture with 422 unreadable and says what to send instead", async () => {
    const picture = await upload({ file: csvFile(PNG_BYTES, "shelf.png", "image/png") });
    expect(picture.status).toBe(422);
    expect(picture.body.error).toEqual({
      code: "unreadable",
      message: '"shelf.png" is a picture, not a CSV file: export one from your spreadsheet as CSV (comma-separated), or start from the template.',
    });
    const disguised = await upload({ file: csvFile(PNG_BYTES, "stock.csv") });
    expect(disguised.status).toBe(422);
    expect(disguised.body.error.message).toMatch(/^This file is not a CSV \(it looks like a picture, a workbook or another binary file\): export one from your spreadsheet as CSV/);
    const semicolons = await upload({ file: csvFile("sku;brand;line\nA;B;C\n") });
    expect(semicolons.status).toBe(422);
    expect(semicolons.body.error.message).toMatch(/separated by semicolons/);
  });

  it("answers 400 without a file, with text in its place, or with an unknown mode", async () => {
    expect((await upload({ mode: "valid-rows" })).body.error).toEqual({ code: "missing_parameter", message: 'The field "file" is required: attach the CSV file.', field: "file" });
    expect((await upload({ file: "sku,brand" })).body.error.code).toBe("invalid_parameter");
    const mode = await upload({ file: csvFile(template), mode: "some-rows" });
    expect(mode).toEqual({ status: 400, body: { error: { code: "invalid_parameter", message: 'The field "mode" is invalid: use all-or-nothing or valid-rows.', field: "mode" } } });
    const json = await callRoute(importCatalog, "POST", "/api/v1/catalog/import", { cookie, body: { file: "x" } });
    expect(json.status).toBe(400);
    expect((await json.json()).error.code).toBe("missing_parameter");
  });
});

describe("GET /api/v1/catalog/export", () => {
  it("answers a CSV file with sku and load_index columns, for the Counter's filters", async () => {
    const response = await callRoute(exportCatalog, "GET", "/api/v1/catalog/export?brand=quensal&stock=in", { cookie });
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="sidewise-catalog-\d{4}-\d{2}-\d{2}\.csv"$/);
    const [header, ...rows] = (await response.text()).split("\r\n");
    expect(header?.split(",")).toEqual(expect.arrayContaining(["sku", "load_index"]));
    expect(rows.length).toBeGreaterThan(10);
    expect(rows.every((row) => row.split(",")[1] === "Quensal" && Number(row.split(",").at(-1)) > 0)).toBe(true);
  });

  it("refuses a filter it does not know with 400", async () => {
    const response = await callRoute(exportCatalog, "GET", "/api/v1/catalog/export?season=monsoon", { cookie });
    expect(response.status).toBe(400);
    expect((await response.json()).error.code).toBe("invalid_parameter");
  });
});
