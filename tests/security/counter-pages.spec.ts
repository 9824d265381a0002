import { expect, test } from "@playwright/test";
import { client, filesNamed } from "./http";
import { CALLERS, COUNTER_PAGES } from "./route-table";

// The Counter's pages per kind of visitor, through HTTP against the production build: signed out →
// sent to sign in; signed in without the role → the refusal in the page's place; with it → the page.
const REFUSAL = "403 · Not for this account";
const rank = { anonymous: -1, customer: 0, staff: 1, admin: 2 } as const;

test("every Counter page is in the table", () => {
  expect(filesNamed("counter", /^page\.tsx$/)).toEqual(COUNTER_PAGES.map((page) => page.file).sort());
});

for (const page of COUNTER_PAGES) {
  test(`${page.path} (${page.role}) per visitor`, async ({ baseURL }) => {
    const anonymous = await client(baseURL!);
    const { items } = await (await anonymous.get("/api/v1/catalog?limit=1")).json();
    const path = page.path.replace("{sku}", items[0].sku);
    for (const who of CALLERS) {
      const visitor = who === "anonymous" ? anonymous : await client(baseURL!, `${who}@sidewise.test`);
      const response = await visitor.get(path, { maxRedirects: 0 });
      if (who === "anonymous") {
        expect(response.status(), who).toBe(307);
        expect(response.headers().location).toBe(`/sign-in?next=${encodeURIComponent(path)}`);
      } else if (rank[who] < rank[page.role]) {
        expect([who, response.status()]).toEqual([who, 200]);
        expect(await response.text()).toContain(REFUSAL);
      } else {
        // Request #1 may not exist yet: then the 404 page, past the role check, is the answer.
        expect(path === "/counter/requests/1" ? [200, 404] : [200], who).toContain(response.status());
        expect(await response.text()).not.toContain(REFUSAL);
      }
      if (visitor !== anonymous) await visitor.dispose();
    }
    await anonymous.dispose();
  });
}
