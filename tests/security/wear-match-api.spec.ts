import { expect, test } from "@playwright/test";
import { client, contractOf } from "./http";

// Wear match seen from outside, over HTTP against the production build. 225/65R17 is 724.3 mm new
// (17 × 25.4 + 2 × 225 × 0.65, ISO 4000-1); 1/32 in is 0.79375 mm (the inch is 25.4 mm exactly);
// the 2/32 in default limit is common practice. Every case below is worked by hand.

interface WearMatchBody {
  size: string;
  new: { overallDiameterMm: number; circumferenceMm: number };
  remaining: { depth32: number; overallDiameterMm: number; circumferenceMm: number }[];
  spread32: number;
  limit: { kind: string; value: number; limit32: number; fromShop: boolean };
  replaceSet: boolean;
  fitsAsIs: boolean;
  shaveTo32: number | null;
}

async function ask(baseURL: string, query: string) {
  const visitor = await client(baseURL);
  const url = `/api/v1/wear-match?${query}`;
  const response = await visitor.get(url);
  expect(await (await contractOf(visitor))("GET", url, response), `GET ${url} as the OpenAPI document describes it`).toBeNull();
  return { status: response.status(), body: (await response.json()) as WearMatchBody & { error?: { code: string; field?: string } } };
}

test("a new tire within 2/32 in of every staying tire fits as it is", async ({ baseURL }) => {
  const { status, body } = await ask(baseURL!, "size=225/65R17&newTreadDepth32=10&remaining32=9,9.5,10&limit32=2");
  expect(status).toBe(200);
  expect(body).toMatchObject({ size: "225-65R17", fitsAsIs: true, replaceSet: false, shaveTo32: null, spread32: 1 });
  expect(body.new.overallDiameterMm).toBeCloseTo(724.3, 9);
  // 9/32 in left of 10: 2 × 1 × 0.79375 = 1.5875 mm less diameter.
  expect(body.remaining[0]!.overallDiameterMm).toBeCloseTo(722.7125, 9);
  expect(body.remaining[0]!.circumferenceMm).toBeCloseTo(Math.PI * 722.7125, 9);
});

test("a new tire too deep for the shallowest staying tire is shaved to that depth plus the limit", async ({ baseURL }) => {
  const { body } = await ask(baseURL!, "size=225-65R17&newTreadDepth32=10&remaining32=6,6,7");
  expect(body).toMatchObject({ fitsAsIs: false, replaceSet: false, shaveTo32: 8, limit: { kind: "depth32", fromShop: true } });
});

test("staying tires too far apart, or a new tire too shallow, mean replacing the set", async ({ baseURL }) => {
  expect((await ask(baseURL!, "size=225-65R17&newTreadDepth32=10&remaining32=5,8&limit32=2")).body).toMatchObject({ replaceSet: true, spread32: 3, shaveTo32: null });
  expect((await ask(baseURL!, "size=225-65R17&newTreadDepth32=8&remaining32=11,11.5&limit32=2")).body).toMatchObject({ replaceSet: true, fitsAsIs: false });
});

test("a circumference limit: 10 mm is 10 / (2π × 0.79375) ≈ 2.0051/32 in of depth, and the shaving depth is unrounded", async ({ baseURL }) => {
  const { body } = await ask(baseURL!, "size=225-65R17&newTreadDepth32=10&remaining32=6,6,6&limitCircumferenceMm=10");
  expect(body.limit).toMatchObject({ kind: "circumferenceMm", value: 10, fromShop: false });
  expect(body.limit.limit32).toBeCloseTo(2.0051, 4);
  expect(body.shaveTo32).toBeCloseTo(8.0051, 4);
});

test("bad input answers 400 or 422 with the field named, never 5xx", async ({ baseURL }) => {
  const cases: [string, number, string][] = [
    ["size=225-65R17&newTreadDepth32=10&remaining32=6,6&limit32=2&limitCircumferenceMm=10", 400, "limitCircumferenceMm"],
    ["size=225-65R17&newTreadDepth32=10&remaining32=6", 400, "remaining32"],
    ["size=225-65R17&newTreadDepth32=10.25&remaining32=6,6", 400, "newTreadDepth32"],
    ["size=225-65R17&remaining32=6,6", 400, "newTreadDepth32"],
    ["size=banana&newTreadDepth32=10&remaining32=6,6", 422, "size"],
  ];
  for (const [query, status, field] of cases) {
    const answer = await ask(baseURL!, query);
    expect(answer.status, query).toBe(status);
    expect(answer.body.error?.field, query).toBe(field);
  }
});
