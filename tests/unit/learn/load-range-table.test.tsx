// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { LoadRangeTable } from "@/components/learn/load-range-table";

afterEach(cleanup);

const rowKeys = () => Array.from(document.querySelectorAll("tbody tr[data-row]")).map((row) => row.getAttribute("data-row"));
const row = (loadRange: string) => document.querySelector(`tbody tr[data-row="${loadRange}"]`)?.textContent ?? "";
const count = () => screen.getByRole("status").textContent ?? "";
const search = (text: string) => fireEvent.change(screen.getByLabelText("Find a load range or a ply rating"), { target: { value: text } });

describe("the load-range table", () => {
  it("lists every load range, lightest first, with its ply rating (TRA convention, common practice)", () => {
    render(<LoadRangeTable />);
    expect(rowKeys()).toEqual(["B", "C", "D", "E", "F", "G", "H", "J", "L", "M", "N"]);
    expect(count()).toContain("Showing 11 of 11");
    expect(row("E")).toContain("10-ply rating");
    expect(row("N")).toContain("24-ply rating");
  });

  it("shows the typical LT maximum pressure where one is known, as common practice (C 50, D 65, E 80, F 95 psi)", () => {
    render(<LoadRangeTable />);
    expect(row("C")).toContain("50 psi / 345 kPa");
    expect(row("E")).toContain("typically take up to 80 psi / 552 kPa cold");
    expect(row("F")).toContain("95 psi / 655 kPa");
    expect(row("G")).toContain("not listed");
    expect(row("B")).toContain("lighter than the usual LT ranges");
    expect(row("G")).toContain("heavier-duty than the usual LT ranges");
  });

  it("finds a range by letter as marked, or by ply rating (10-ply is load range E, common practice)", () => {
    render(<LoadRangeTable />);
    search("Load Range E");
    expect(rowKeys()).toEqual(["E"]);
    search("lrd");
    expect(rowKeys()).toEqual(["D"]);
    search("10 PR");
    expect(rowKeys()).toEqual(["E"]);
    expect(count()).toContain("A 10-ply rating is load range E.");
    search("7");
    expect(rowKeys()).toEqual([]);
    expect(count()).toContain("No load range has a 7-ply rating.");
    expect(count()).toContain("Showing 0 of 11");
  });
});
