import { describe, expect, it } from "vitest";
import { parseMarking, toErrorBody } from "@/lib/tire";

function error(text: string) {
  const r = parseMarking(text);
  if (r.ok) expect.fail(`"${text}" should not read`);
  return r.error;
}

describe("text that cannot be read", () => {
  it.each(["", "   ", "\n\t"])("empty input %j says there is nothing to read", (text) => {
    expect(error(text)).toMatchObject({ code: "unreadable", message: expect.stringContaining("empty") });
  });

  it.each(["hello", "asdf qwer", "???", "日本語", "🚗💨"])("garbage %j is unreadable, with an example of what to type", (text) => {
    const e = error(text);
    expect(e.code).toBe("unreadable");
    expect(e.suggestion).toContain("205/55R16");
  });

  it("285/50R: the rim diameter is missing", () => {
    const e = error("285/50R");
    expect(e.message).toContain("rim diameter is missing");
    expect(e.suggestion).toContain("285/50R");
  });

  it.each([
    ["285/50", "construction letter and rim diameter are missing"],
    ["285/R20", "aspect ratio is missing"],
    ["R20", "section width and aspect ratio are missing"],
    ["285/50R2", "rim diameter of 2 in"],
    ["285/50Q20", '"Q" is not a construction code'],
    ["285/15R20", "aspect ratio of 15"],
    ["999/50R20", "section width of 999 mm"],
    ["33x12.50", "construction letter and rim diameter are missing"],
    ["12x12.50R15", "do not make a flotation size"],
  ])("%s: %s", (text, fragment) => {
    expect(error(text).message).toContain(fragment);
  });

  it("a lone speed symbol is explained (ISO 4000-1: V = 240 km/h)", () => {
    expect(error("V").suggestion).toContain("240 km/h");
  });

  it("a lone date code is pointed to DOT (49 CFR 574.5 date code)", () => {
    expect(error("3208").suggestion).toContain("DOT 3208");
  });

  it("a size problem beside readable parts becomes a warning, not an error", () => {
    const r = parseMarking("285/50R 116T");
    expect(r.ok).toBe(true);
    expect(r.ok && r.warnings.join(" ")).toContain("rim diameter is missing");
  });

  it("an unknown load index or speed symbol fails even beside readable parts", () => {
    expect(error("285/50R20 116Z M+S").code).toBe("unknown_speed_symbol");
    expect(error("285/50R20 300T M+S").code).toBe("unknown_load_index");
  });

  it("the API error body carries code and message only, with the suggestion folded in", () => {
    const body = toErrorBody(error("285/50R"));
    expect(Object.keys(body.error)).toEqual(["code", "message"]);
    expect(body.error.message).toMatch(/rim diameter is missing\..*Add the rim diameter/);
  });

  it("does not throw for values that are not strings", () => {
    expect(parseMarking(undefined as unknown as string).ok).toBe(false);
    expect(parseMarking(42 as unknown as string).ok).toBe(false);
  });
});
