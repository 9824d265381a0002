import { describe, expect, it } from "vitest";
import { readCatalogCsv } from "@/lib/catalog-csv/read-file";
import { readCatalogCsvInSteps } from "@/lib/catalog-csv/read-file-in-steps";
import { writeCatalogCsv } from "@/lib/catalog-csv/write-file";
import { generatedCsvItems } from "../../fixtures/generated-csv-items";

describe("reading a catalog CSV in steps on the server", () => {
  it("answers exactly what reading it whole answers: rows, refusals on their lines, repeated SKUs across batches", async () => {
    const items = generatedCsvItems(1_600, { seed: 3, skuPrefix: "STEP" });
    // A bad size, a SKU repeated far from its first line (in another batch), a comment and a blank row.
    items[10] = { ...items[10]!, designation: "not a size" };
    items[1_200] = { ...items[1_200]!, sku: items[20]!.sku };
    const lines = writeCatalogCsv(items).split("\r\n");
    lines.splice(700, 0, "# a note for whoever edits the file", "");
    const text = lines.join("\r\n");

    const whole = readCatalogCsv(text);
    expect(whole.ok && whole.refusals.map((refusal) => refusal.column)).toEqual(["size", "sku"]);
    expect(await readCatalogCsvInSteps(text)).toEqual(whole);
  });

  it("answers a wrong header and a file that is not a CSV as reading it whole does", async () => {
    for (const text of ["sku;size;price\nA;205/55R16;100\n", "", "name,colour\nA,red\n"]) {
      expect(await readCatalogCsvInSteps(text)).toEqual(readCatalogCsv(text));
    }
  });
});
