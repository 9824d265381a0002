import { expect, test, type Page, staffFlowsAtDesktopWidth } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const HEADER = "sku,brand,line,size,load_index,load_index_dual,speed_symbol,load_range,extra_load,price,quantity";

async function signInTo(page: Page, email: string) {
  await page.goto("/counter/import");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fcounter%2Fimport$/);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/counter\/import$/);
}

/** Invented stock in a demo brand and line; a row on a line in `badLines` carries load index 999, which no table has. */
function catalogCsv(skuPrefix: string, rows: number, badLines: number[] = []): Buffer {
  const lines = [HEADER];
  for (let index = 0; index < rows; index += 1) {
    const loadIndex = badLines.includes(index + 2) ? "999" : "102";
    lines.push(`${skuPrefix}-${String(index).padStart(4, "0")},Quensal,Aldermoor Tour,225/65R17,${loadIndex},,H,,no,${100 + (index % 50)}.00,${index % 9}`);
  }
  return Buffer.from(`${lines.join("\n")}\n`);
}

function chooseFile(page: Page, name: string, buffer: Buffer, mimeType = "text/csv") {
  return page.getByLabel(/choose a file/).setInputFiles({ name, mimeType, buffer });
}

test.describe("the Counter's import and export", () => {
  staffFlowsAtDesktopWidth();
  test("staff read, preview and import a CSV, then see a refused file write nothing", async ({ page }, testInfo) => {
    // Two imports and four accessibility scans in one story.
    test.slow();
    const prefix = `IMP-${testInfo.project.name.toUpperCase()}-${Date.now().toString(36).toUpperCase()}`;
    await signInTo(page, "staff@sidewise.test");
    await expect(page.getByRole("heading", { level: 1, name: "Import & export" })).toBeVisible();
    await expect(page.getByRole("link", { name: "Download the template CSV" })).toHaveAttribute("href", "/downloads/sidewise-catalog-template.csv");
    await expect(page.getByRole("link", { name: "Export the whole catalog as CSV" })).toHaveAttribute("href", "/api/v1/catalog/export");
    await expectNoAxeViolations(page);

    await chooseFile(page, "new-stock.csv", catalogCsv(prefix, 300));
    await expect(page.getByRole("progressbar", { name: "Reading and checking new-stock.csv" })).toBeVisible();
    await expect(page.getByText("300 rows read and checked · 100 %")).toBeVisible();
    await expect(page.getByRole("table", { name: "First 10 rows of the file" }).getByRole("row")).toHaveCount(11);
    await expect(page.getByText("Rows that look valid").locator("..")).toContainText("300");
    await expectNoAxeViolations(page);

    await page.getByRole("button", { name: "Import 300 rows" }).click();
    const report = page.getByRole("heading", { name: "Import report" });
    await expect(report).toBeFocused();
    await expect(page.getByText("Written: 300 rows added, 0 rows updated.")).toBeVisible();
    await expectNoAxeViolations(page);

    await page.getByRole("button", { name: "Upload another file" }).click();
    await expect(page.getByLabel(/choose a file/)).toBeFocused();
    await chooseFile(page, "one-bad-row.csv", catalogCsv(`${prefix}-B`, 20, [7]));
    await expect(page.getByText("20 rows read and checked · 100 %")).toBeVisible();
    await expect(page.getByRole("table", { name: "Problems found in the browser" })).toContainText("load_index");
    await expect(page.getByLabel(/All or nothing \(recommended\)/)).toBeChecked();
    await page.getByRole("button", { name: "Nothing will be written: 1 row is refused — fix it or choose 'import the valid rows'" }).click();
    await expect(page.getByRole("heading", { name: "Import report" })).toBeFocused();
    await expect(page.getByText(/Nothing was written: 1 row was refused\. Fix them and upload again/)).toBeVisible();
    const refusedRow = page.getByRole("table", { name: "Rows the server refused" }).getByRole("row").nth(1);
    await expect(refusedRow.getByRole("cell").nth(0)).toHaveText("7");
    await expect(refusedRow.getByRole("cell").nth(1)).toHaveText("load_index");
    await expect(refusedRow.getByRole("cell").nth(2)).toContainText("999");
    await expectNoAxeViolations(page);
  });

  test("a file that is not a CSV is refused at once with what to do", async ({ page }) => {
    await signInTo(page, "staff@sidewise.test");
    await chooseFile(page, "stock.xlsx", Buffer.from("PK\u0003\u0004"), "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    await expect(page.getByRole("alert").filter({ hasText: '"stock.xlsx" is a spreadsheet workbook, not a CSV file' })).toBeVisible();
    await expect(page.getByRole("progressbar")).toHaveCount(0);
    await expectNoAxeViolations(page);
  });

  test("a customer is refused the import screen", async ({ page }) => {
    await signInTo(page, "customer@sidewise.test");
    await expect(page.getByRole("heading", { level: 1, name: "The Counter is for shop staff" })).toBeVisible();
    await expect(page.getByLabel(/choose a file/)).toHaveCount(0);
    await expectNoAxeViolations(page);
  });
});
