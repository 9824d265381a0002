import { describe, expect, it } from "vitest";
import { parseQuery } from "@/lib/api/query";
import { evaluateWearMatch, wearMatchBody, wearMatchQuerySchema } from "@/lib/wear-match/wear-match-api";

const query = (search: string) => parseQuery(new URL(`http://localhost/api/v1/wear-match?${search}`), wearMatchQuerySchema);

async function errorOf(search: string): Promise<{ status: number; code: string; field?: string; message: string }> {
  const parsed = query(search);
  if (parsed.ok) throw new Error("expected a refusal");
  const { error } = (await parsed.response.json()) as { error: { code: string; field?: string; message: string } };
  return { status: parsed.response.status, ...error };
}

describe("GET /api/v1/wear-match's query", () => {
  it("reads a size, the new depth, the depths that stay and one limit", () => {
    const parsed = query("size=225/65R17&newTreadDepth32=10.5&remaining32=6, 6.5,7&limit32=2");
    expect(parsed).toMatchObject({ ok: true, value: { size: "225/65R17", newTreadDepth32: 10.5, remaining32: [6, 6.5, 7], limit32: 2 } });
  });

  it("refuses both limits at once, naming the second", async () => {
    expect(await errorOf("size=225-65R17&newTreadDepth32=10&remaining32=6,6&limit32=2&limitCircumferenceMm=10")).toMatchObject({
      status: 400,
      code: "invalid_parameter",
      field: "limitCircumferenceMm",
    });
  });

  it.each([
    ["remaining32=6", "remaining32"],
    ["remaining32=6,6,6,6", "remaining32"],
    ["remaining32=6,6.25", "remaining32"],
    ["remaining32=6,x", "remaining32"],
    ["remaining32=6,40", "remaining32"],
  ])("refuses %s with a message saying what to give", async (staying, field) => {
    const error = await errorOf(`size=225-65R17&newTreadDepth32=10&${staying}`);
    expect(error).toMatchObject({ status: 400, code: "invalid_parameter", field });
    expect(error.message).toContain("32nds");
  });

  it("asks for the new depth when it is missing", async () => {
    expect(await errorOf("size=225-65R17&remaining32=6,6")).toMatchObject({ status: 400, code: "missing_parameter", field: "newTreadDepth32" });
  });
});

describe("the answer", () => {
  const valid = (search: string) => {
    const parsed = query(search);
    if (!parsed.ok) throw new Error("expected a valid query");
    const evaluation = evaluateWearMatch(parsed.value, 2);
    return evaluation.ok ? { ok: true as const, body: wearMatchBody(evaluation) } : evaluation;
  };

  it("takes the shop's default limit when the query names none, and says so", () => {
    const answer = valid("size=225-65R17&newTreadDepth32=10&remaining32=6,6,7");
    expect(answer).toMatchObject({ ok: true, body: { size: "225-65R17", limit: { kind: "depth32", value: 2, fromShop: true }, shaveTo32: 8, fitsAsIs: false, replaceSet: false } });
  });

  it("answers a circumference limit unrounded", () => {
    const answer = valid("size=225-65R17&newTreadDepth32=10&remaining32=6,6,6&limitCircumferenceMm=10");
    expect(answer.ok && answer.body.shaveTo32).toBeCloseTo(8.0051, 4);
    expect(answer.ok && answer.body.limit.fromShop).toBe(false);
  });

  it("refuses a size it cannot read or measure with 422", () => {
    expect(valid("size=banana&newTreadDepth32=10&remaining32=6,6")).toMatchObject({ ok: false, code: "unreadable", field: "size" });
    expect(valid("size=11R22.5&newTreadDepth32=10&remaining32=6,6")).toMatchObject({ ok: false, code: "unreadable", field: "size" });
  });
});
