import { expect, test } from "@playwright/test";
import { client, contractOf } from "./http";

// The Plus planner's default width rule seen from outside, over HTTP against the production build.
// The rule is common practice: section widths from the original − 10 mm (− 20 mm on a smaller
// wheel) to the original + 20 mm, plus 10 mm for each inch added.

interface Candidate {
  designation: string;
  plus: number;
  sectionWidthMm: number;
  diameterDiffPct: number;
}

async function candidates(baseURL: string, query: string): Promise<Candidate[]> {
  const visitor = await client(baseURL);
  const url = `/api/v1/plus?${query}`;
  const response = await visitor.get(url);
  expect(response.status(), query).toBe(200);
  expect(await (await contractOf(visitor))("GET", url, response), `GET ${url} as the OpenAPI document describes it`).toBeNull();
  return ((await response.json()) as { candidates: Candidate[] }).candidates;
}

test("GET /api/v1/plus lists only the widths a wheel takes in practice unless all=true", async ({ baseURL }) => {
  const practical = await candidates(baseURL!, "size=225-45R17");
  const every = await candidates(baseURL!, "size=225-45R17&all=true");
  const names = practical.map((candidate) => candidate.designation);

  // Sizes no one would fit on a 17-inch wheel in place of a 225: far narrower and far wider.
  expect(every.map((candidate) => candidate.designation)).toEqual(expect.arrayContaining(["125/80R17", "345/30R17"]));
  expect(names).not.toContain("125/80R17");
  expect(names).not.toContain("345/30R17");
  expect(names).toContain("225/45R17");
  expect(practical.length).toBeLessThan(every.length);

  for (const candidate of practical) {
    const narrowest = candidate.plus < 0 ? 205 : 215;
    const widest = 245 + 10 * Math.max(candidate.plus, 0);
    expect(candidate.sectionWidthMm, candidate.designation).toBeGreaterThanOrEqual(narrowest);
    expect(candidate.sectionWidthMm, candidate.designation).toBeLessThanOrEqual(widest);
  }
  // Every size the rule lets through is listed, in the same order as the full list.
  const inRule = every.filter((candidate) => candidate.sectionWidthMm >= (candidate.plus < 0 ? 205 : 215) && candidate.sectionWidthMm <= 245 + 10 * Math.max(candidate.plus, 0));
  expect(names).toEqual(inRule.map((candidate) => candidate.designation));
});

test("GET /api/v1/plus refuses an all flag it cannot read, naming the field", async ({ baseURL }) => {
  const visitor = await client(baseURL!);
  const response = await visitor.get("/api/v1/plus?size=225-45R17&all=sometimes");
  expect(response.status()).toBe(400);
  expect((await response.json()).error).toMatchObject({ field: "all" });
});
