import { expectNoAxeViolations } from "./helpers/axe";
import { signIn } from "./helpers/finder";
import { expect, test } from "./helpers/test";

// The Counter's staff flows run in the desktop project (counter*.spec.ts); at phone width each of
// their pages is scanned here, with one sign-in. Requests, fittings, cards and the outbox are scanned
// at both widths by the flows that reach them (counter-offers.spec.ts, fit-card.spec.ts).
const pages = [
  { path: "/counter", heading: /Counter/ },
  { path: "/counter/items/new", heading: "Add an item" },
  { path: "/counter/lines", heading: "Brands and lines" },
  { path: "/counter/import", heading: "Import & export" },
  { path: "/counter/shop", heading: "Shop settings" },
  { path: "/counter/team", heading: "Team" },
  { path: "/counter/audit", heading: "Audit log" },
];

test.describe("the Counter at phone width", () => {
  test.skip(({ isMobile }) => !isMobile, "the phone project; the desktop project runs the flows on these pages");

  test("every staff page has no accessibility violations", async ({ page }) => {
    test.slow();
    await signIn(page, "admin@sidewise.test");
    for (const { path, heading } of pages) {
      await page.goto(path);
      await expect(page).toHaveURL(new RegExp(`${path}$`));
      await expect(page.getByRole("heading", { level: 1, name: heading })).toBeVisible();
      await expectNoAxeViolations(page);
    }
  });
});
