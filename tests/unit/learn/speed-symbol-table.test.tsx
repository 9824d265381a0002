// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { SpeedSymbolTable } from "@/components/learn/speed-symbol-table";

afterEach(cleanup);

const rowKeys = () => Array.from(document.querySelectorAll("tbody tr[data-row]")).map((row) => row.getAttribute("data-row"));
const unfoldedKeys = () =>
  Array.from(document.querySelectorAll("tbody tr[data-row]:not([data-folded])")).map((row) => row.getAttribute("data-row"));
const row = (symbol: string) => document.querySelector(`tbody tr[data-row="${symbol}"]`)?.textContent ?? "";
const count = () => screen.getByRole("status").textContent ?? "";
const search = (text: string) => fireEvent.change(screen.getByLabelText("Find a speed symbol or a speed"), { target: { value: text } });

describe("the speed-symbol table", () => {
  it("lists every symbol from A1 to (Y) in order of speed, with H between U and V (UN R30; Arrêté of 24 Oct 1994, Annex I)", () => {
    render(<SpeedSymbolTable />);
    const keys = rowKeys();
    expect(keys).toHaveLength(30);
    expect(keys.slice(0, 8)).toEqual(["A1", "A2", "A3", "A4", "A5", "A6", "A7", "A8"]);
    expect(keys.slice(-6)).toEqual(["U", "H", "V", "W", "Y", "(Y)"]);
    expect(keys.indexOf("H")).toBe(keys.indexOf("U") + 1);
    expect(keys.indexOf("V")).toBe(keys.indexOf("H") + 1);
  });

  it("says what each symbol means in km/h and mph (W, Y and (Y) as in the EU tyre database, Regulation (EU) 2020/740)", () => {
    render(<SpeedSymbolTable />);
    expect(row("H")).toContain("built for up to 210 km/h / 130 mph");
    expect(row("V")).toContain("built for up to 240 km/h / 149 mph");
    expect(row("Y")).toContain("built for up to 300 km/h / 186 mph");
    expect(row("(Y)")).toContain("built for above 300 km/h / 186 mph");
  });

  it("finds a symbol by its letter, in any case", () => {
    render(<SpeedSymbolTable />);
    search("h");
    expect(rowKeys()).toEqual(["H"]);
    expect(count()).toContain("Showing 1 of 30");
    search("y");
    expect(rowKeys()).toEqual(["Y", "(Y)"]);
    search("(Y)");
    expect(rowKeys()).toEqual(["(Y)"]);
    search("95H");
    expect(rowKeys()).toEqual(["H"]);
  });

  it("finds the slowest symbol for a speed, read as km/h and as mph", () => {
    render(<SpeedSymbolTable />);
    search("130 mph");
    // 130 mph ≈ 209 km/h: U (200 km/h) is too slow, H (210 km/h) is the slowest that will do (UN R30 table).
    expect(rowKeys()).toEqual(["U", "H"]);
    expect(count()).toContain("130 mph needs speed symbol H or faster.");
    search("130");
    expect(rowKeys()).toEqual(["L", "M", "U", "H"]);
    expect(count()).toContain("Showing 4 of 30");
    search("320 km/h");
    expect(rowKeys()).toEqual(["Y", "(Y)"]);
  });

  it("opens at the symbols of cars and light trucks, L and faster (common practice), the slow ones folded away until asked for", () => {
    render(<SpeedSymbolTable />);
    expect(unfoldedKeys()[0]).toBe("L");
    expect(unfoldedKeys()).toHaveLength(14);
    expect(count()).toContain("Showing 14 of 30 speed symbols: those of cars and light trucks");
    search("K");
    expect(unfoldedKeys()).toEqual(["K"]);
    search("");
    fireEvent.click(screen.getByLabelText("Show all 30 speed symbols, slow machines too"));
    expect(unfoldedKeys()).toHaveLength(30);
    expect(count()).toContain("Showing 30 of 30");
  });
});
