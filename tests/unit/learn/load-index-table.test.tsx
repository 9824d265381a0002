// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { LoadIndexTable } from "@/components/learn/load-index-table";

afterEach(cleanup);

const rows = () => Array.from(document.querySelectorAll("tbody tr[data-row]"));
const rowKeys = () => rows().map((row) => row.getAttribute("data-row"));
const unfoldedKeys = () => rows().filter((row) => !row.hasAttribute("data-folded")).map((row) => row.getAttribute("data-row"));
const count = () => screen.getByRole("status").textContent ?? "";
const search = (text: string) => fireEvent.change(screen.getByLabelText("Find a load index or a weight"), { target: { value: text } });

describe("the load-index table", () => {
  it("holds all 280 load indices, 0 to 279, each saying what it carries (ISO 4000-1 / ETRTO load-index table)", () => {
    render(<LoadIndexTable />);
    expect(rows()).toHaveLength(280);
    expect(rowKeys()[0]).toBe("0");
    expect(rowKeys()[279]).toBe("279");
    expect(document.getElementById("load-index-150")?.getAttribute("data-row")).toBe("150");
    // Index 0 = 45 kg; index 279 = 136,000 kg (ISO 4000-1 table; lb = kg × 2.20462, rounded).
    expect(rows()[0]?.textContent).toContain("carries 45 kg / 99 lb per tire");
    expect(rows()[279]?.textContent).toContain("carries 136,000 kg / 299,828 lb per tire");
  });

  it("finds load index 119: 1,360 kg / 2,998 lb per tire (ISO 4000-1 / ETRTO)", () => {
    render(<LoadIndexTable />);
    search("119");
    expect(rowKeys()).toEqual(["119"]);
    expect(rows()[0]?.textContent).toContain("carries 1,360 kg / 2,998 lb per tire");
    expect(count()).toContain("Showing 1 of 280");
  });

  it("reads a service description as printed on the sidewall", () => {
    render(<LoadIndexTable />);
    search("123/120S");
    expect(rowKeys()).toEqual(["123"]);
  });

  it("finds the rows around a weight, read as kg and as lb, and names the lowest index that carries it", () => {
    render(<LoadIndexTable />);
    search("1360");
    // 1,360 kg: 118 carries 1,320 kg, 119 carries 1,360 kg; 1,360 lb: 91 carries 1,356 lb, 92 carries 1,389 lb (ISO 4000-1 table).
    expect(rowKeys()).toEqual(["91", "92", "118", "119"]);
    expect(count()).toContain("Showing 4 of 280");
    expect(count()).toContain("1,360 kg per tire needs load index 119 or higher.");
    expect(count()).toContain("1,360 lb per tire needs load index 92 or higher.");
    expect(document.querySelector('tr[data-row="119"]')?.textContent).toContain("lowest for 1,360 kg");
  });

  it("honours a unit and thousands separators", () => {
    render(<LoadIndexTable />);
    search("2,998 lb");
    expect(rowKeys()).toEqual(["118", "119"]);
    search("1,361 kg");
    // 1,361 kg is just over index 119, so index 120 (1,400 kg) is the lowest (ISO 4000-1 table).
    expect(rowKeys()).toEqual(["119", "120"]);
  });

  it("says when no index carries a weight, and when nothing matches", () => {
    render(<LoadIndexTable />);
    search("200000 kg");
    expect(count()).toContain("the table ends at 279");
    search("xyz");
    expect(rows()).toHaveLength(0);
    expect(count()).toContain("Showing 0 of 280");
    expect(document.querySelector("tbody")?.textContent).toContain("Nothing matches");
  });

  it("opens at the indices common on cars and light trucks, 60 to 130 (common practice), the rest folded away until asked for", () => {
    render(<LoadIndexTable />);
    const keys = unfoldedKeys();
    expect(keys).toHaveLength(71);
    expect(keys[0]).toBe("60");
    expect(keys[70]).toBe("130");
    expect(count()).toContain("Showing 71 of 280 load indices: those common on cars and light trucks");
    fireEvent.click(screen.getByLabelText("Show all 280 load indices"));
    expect(unfoldedKeys()).toHaveLength(280);
    expect(count()).toContain("Showing 280 of 280");
  });

  it("searches every load index, not only the common range", () => {
    render(<LoadIndexTable />);
    search("150");
    expect(unfoldedKeys()).toEqual(["150"]);
    search("");
    expect(unfoldedKeys()).toHaveLength(71);
  });
});
