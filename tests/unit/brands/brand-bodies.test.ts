import { describe, expect, it } from "vitest";
import { brandParamsSchema, lineChangesSchema, newBrandSchema, newLineSchema } from "@/lib/brands/brand-bodies";
import { checkLineChanges, checkNewLine, EMPTY_LINE } from "@/components/counter/lines-form-check";

const firstIssue = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) => result.error?.issues[0];

describe("brand and line names", () => {
  it("are trimmed, with runs of spaces made one", () => {
    expect(newBrandSchema.parse({ name: "  Lumbrel \u00a0  Works " })).toEqual({ name: "Lumbrel Works" });
  });

  it.each([
    ["", "give the brand a name"],
    ["    ", "give the brand a name"],
    ["x".repeat(41), "a brand name is at most 40 characters"],
    ["-- / --", "a brand name needs at least one letter or digit"],
    ["Tab\there", "Remove the control characters (such as NUL) from this text"],
    ["Nul\u0000", "Remove the control characters (such as NUL) from this text"],
    ["Broken \ud800", "the brand name holds a broken character; type it again"],
  ])("refuse %j: %s", (name, message) => {
    expect(firstIssue(newBrandSchema.safeParse({ name }))?.message).toBe(message);
  });

  it("take letters of any script and digits, up to the limit", () => {
    expect(newBrandSchema.safeParse({ name: "Ørnvik 4x4" }).success).toBe(true);
    expect(newLineSchema.safeParse({ name: "x".repeat(60), season: "winter", terrain: "highway", threePeak: true }).success).toBe(true);
  });
});

describe("a line's fields", () => {
  const line = { name: "Hollin Trail", season: "all-season", terrain: "all-terrain", threePeak: true };

  it("take a season and terrain from the shared lists, and a tread depth of 2 to 40 32nds or none", () => {
    expect(newLineSchema.parse(line)).toEqual(line);
    expect(newLineSchema.parse({ ...line, treadDepth32: null })).toMatchObject({ treadDepth32: null });
    // New passenger tires are about 10/32 to 12/32 in, mud-terrain about 20/32 (common practice).
    for (const depth of [2, 10, 20, 40]) expect(newLineSchema.safeParse({ ...line, treadDepth32: depth }).success).toBe(true);
    for (const depth of [0, 1, 41, 10.5, "10"]) expect(firstIssue(newLineSchema.safeParse({ ...line, treadDepth32: depth }))?.path).toEqual(["treadDepth32"]);
    expect(firstIssue(newLineSchema.safeParse({ ...line, season: "spring" }))?.message).toBe("choose one of all-season, all-weather, summer, winter");
    expect(firstIssue(newLineSchema.safeParse({ ...line, terrain: "sand" }))?.path).toEqual(["terrain"]);
  });

  it("change one at a time, retired included, but not none and nothing unknown", () => {
    expect(lineChangesSchema.parse({ retired: true })).toEqual({ retired: true });
    expect(lineChangesSchema.safeParse({}).success).toBe(false);
    expect(lineChangesSchema.safeParse({ brandId: 2 }).success).toBe(false);
  });
});

describe("ids in a path", () => {
  it("are digits within PostgreSQL's integer, nothing else", () => {
    expect(brandParamsSchema.parse({ id: "42" })).toEqual({ id: 42 });
    expect(brandParamsSchema.parse({ id: "2147483647" })).toEqual({ id: 2_147_483_647 });
    for (const id of ["0", "07", "-1", "1e3", "0x1", " 1", "2147483648", "abc", ""]) expect(brandParamsSchema.safeParse({ id }).success).toBe(false);
  });
});

describe("the Lines page's forms", () => {
  it("check a new line as the API will, each field's problem as a sentence", () => {
    expect(checkNewLine({ ...EMPTY_LINE, name: "Hollin Tour", treadDepth32: "11" })).toEqual({
      ok: true,
      body: { name: "Hollin Tour", season: "all-season", terrain: "highway", threePeak: false, treadDepth32: 11 },
    });
    expect(checkNewLine({ ...EMPTY_LINE, name: " ", treadDepth32: "ten" })).toEqual({
      ok: false,
      errors: {
        name: "Give the line a name.",
        treadDepth32: "Give the tread depth as a whole number of 32nds of an inch from 2 to 40, such as 10 for 10/32 in.",
      },
    });
  });

  it("send only the fields that changed, and nothing when none did", () => {
    const listed = { id: 3, name: "Hollin Tour", season: "summer", terrain: "highway", threePeak: false, treadDepth32: null, retired: false } as const;
    const values = { name: "Hollin Tour", season: "summer", terrain: "highway", threePeak: false, treadDepth32: "" } as const;
    expect(checkLineChanges(values, listed)).toEqual({ ok: true, body: null });
    expect(checkLineChanges({ ...values, treadDepth32: "9", threePeak: true }, listed)).toEqual({ ok: true, body: { threePeak: true, treadDepth32: 9 } });
  });
});
