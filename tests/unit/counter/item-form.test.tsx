// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { ItemForm } from "@/components/counter/item-form";
import { ItemRetire } from "@/components/counter/item-retire";

const push = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ push, refresh: vi.fn() }) }));

const fetchMock = vi.fn();
beforeEach(() => {
  push.mockReset();
  fetchMock.mockReset();
  vi.stubGlobal("fetch", fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const line = (id: number, name: string, more: { retired?: boolean; treadDepth32?: number | null } = {}) =>
  ({ id, name, season: "all-season", terrain: "highway", threePeak: false, treadDepth32: 11, retired: false, ...more }) as const;
const brands = [{ id: 1, name: "Quensal", lines: [line(1, "Aldermoor Tour"), line(2, "Bexford AT", { treadDepth32: 15 }), line(3, "Caddon MT", { retired: true })] }];
const empty = {
  sku: "", brand: "", line: "", designation: "", loadIndex: "", loadIndexDual: "", speedSymbol: "", loadRange: "", extraLoad: false, priceCents: "", quantity: "0", treadDepth32: "",
};

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

function fillValidItem() {
  fill("SKU", "QNS-NEW-1");
  fill("Brand", "Quensal");
  fill("Line", "Bexford AT");
  fill("Size", "lt265/75r16");
  fill("Load index", "123");
  fill("Dual load index (optional)", "120");
  fill("Speed symbol", "r");
  fill("Load range (LT only, e.g. E)", "E");
  fill("Price (US dollars)", "219.50");
  fill("Quantity on hand", "4");
}

const submit = () => fireEvent.click(screen.getByRole("button", { name: "Add this item" }));

describe("the item form", () => {
  it("shows what the tire core reads in the size as it is typed", () => {
    render(<ItemForm brands={brands} initial={empty} />);
    fill("Size", "lt265/75r16");
    // LT265/75R16: 16 × 25.4 + 2 × 265 × 0.75 = 803.9 mm (nominal geometry, common practice).
    expect(screen.getByText(/Reads as/).textContent).toBe("Reads as LT265/75R16 · light truck (LT) · overall diameter 804 mm (31.6 in)");
    expect(screen.getByLabelText("Size").getAttribute("aria-describedby")).toContain("item-size-reading");
  });

  it("names each unreadable field and focuses the first, sending nothing", async () => {
    render(<ItemForm brands={brands} initial={empty} />);
    fill("Load index", "ninety");
    submit();
    const sku = screen.getByLabelText("SKU");
    expect(sku.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById(sku.getAttribute("aria-describedby")!)?.textContent).toBe("Enter the SKU.");
    expect(screen.getByText("Enter the load index as a whole number, like 91.")).toBeTruthy();
    await waitFor(() => expect(document.activeElement).toBe(sku));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("checks the item with the tire core before sending: a passenger size carries no load range", () => {
    render(<ItemForm brands={brands} initial={empty} />);
    fillValidItem();
    fill("Size", "265/75R16");
    fill("Dual load index (optional)", "");
    submit();
    // A load range belongs to LT sizes; passenger tires are standard or extra load (common practice).
    expect(screen.getByLabelText("Load range (LT only, e.g. E)").getAttribute("aria-invalid")).toBe("true");
    expect(screen.getByText("Passenger tires are standard or extra load, not a load range.")).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("posts a new item to the catalog API and goes back to the table with a status", async () => {
    fetchMock.mockResolvedValue(new Response("{}", { status: 201 }));
    render(<ItemForm brands={brands} initial={empty} />);
    fillValidItem();
    submit();
    await waitFor(() => expect(push).toHaveBeenCalledWith("/counter?q=QNS-NEW-1&added=QNS-NEW-1"));
    const [path, init] = fetchMock.mock.calls[0]!;
    expect(path).toBe("/api/v1/catalog");
    expect(JSON.parse(init.body)).toEqual({
      sku: "QNS-NEW-1", brand: "Quensal", line: "Bexford AT", designation: "lt265/75r16", loadIndex: 123, loadIndexDual: 120,
      speedSymbol: "r", loadRange: "E", extraLoad: false, priceCents: 21_950, quantity: 4, treadDepth32: null,
    });
  });

  it("offers no retired line for a new item, links to the Lines page, and names the line's tread depth", () => {
    render(<ItemForm brands={brands} initial={empty} />);
    fill("Brand", "Quensal");
    const retired = screen.getByRole("option", { name: "Caddon MT (retired)" }) as HTMLOptionElement;
    expect(retired.disabled).toBe(true);
    expect(screen.getByRole("link", { name: "Add it on the Lines page" }).getAttribute("href")).toBe("/counter/lines");
    fill("Line", "Bexford AT");
    expect(screen.getByText("Leave empty to use the line's 15/32 in.")).toBeTruthy();
  });

  it("keeps an item's retired line selectable when it is edited", () => {
    render(<ItemForm brands={brands} initial={{ ...empty, brand: "Quensal", line: "Caddon MT" }} sku="QNS-8" />);
    expect((screen.getByRole("option", { name: "Caddon MT (retired)" }) as HTMLOptionElement).disabled).toBe(false);
  });

  it("sends the item's own tread depth, checked in the browser first", async () => {
    fetchMock.mockResolvedValue(new Response("{}", { status: 201 }));
    render(<ItemForm brands={brands} initial={empty} />);
    fillValidItem();
    fill("Tread depth, new (32nds, optional)", "90");
    submit();
    // New tires are a few 32nds to about 20/32 deep (common practice); 90 is a typing slip.
    expect(screen.getByText(/Give the tread depth as a whole number of 32nds of an inch from 2 to 40/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fill("Tread depth, new (32nds, optional)", "16");
    submit();
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    expect(JSON.parse(fetchMock.mock.calls[0]![1].body)).toMatchObject({ treadDepth32: 16 });
  });

  it("puts a refusal from the server next to the field it names", async () => {
    fetchMock.mockResolvedValue(new Response(JSON.stringify({ error: { code: "already_exists", message: 'The SKU "QNS-NEW-1" is taken (retired items keep theirs).', field: "sku" } }), { status: 409 }));
    render(<ItemForm brands={brands} initial={empty} />);
    fillValidItem();
    submit();
    await waitFor(() => expect(screen.getByText('The SKU "QNS-NEW-1" is taken (retired items keep theirs).')).toBeTruthy());
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText("SKU")));
  });

  it("sends an edit as a PATCH without the SKU", async () => {
    fetchMock.mockResolvedValue(new Response("{}", { status: 200 }));
    const initial = { ...empty, sku: "QNS-7", brand: "Quensal", line: "Aldermoor Tour", designation: "205/55R16", loadIndex: "91", speedSymbol: "V", priceCents: "120.00", quantity: "8" };
    render(<ItemForm brands={brands} initial={initial} sku="QNS-7" />);
    expect(screen.queryByLabelText("SKU")).toBeNull();
    fill("Price (US dollars)", "125");
    fireEvent.click(screen.getByRole("button", { name: "Save changes" }));
    await waitFor(() => expect(push).toHaveBeenCalledWith("/counter?q=QNS-7&saved=QNS-7"));
    const [path, init] = fetchMock.mock.calls[0]!;
    expect([path, init.method]).toEqual(["/api/v1/catalog/QNS-7", "PATCH"]);
    expect(JSON.parse(init.body)).not.toHaveProperty("sku");
    expect(JSON.parse(init.body)).toMatchObject({ priceCents: 12_500, loadIndexDual: null, loadRange: null });
  });
});

describe("retiring an item", () => {
  it("asks once more, then retires through the API and goes back to the table", async () => {
    fetchMock.mockResolvedValue(new Response(null, { status: 204 }));
    render(<ItemRetire sku="QNS-7" />);
    fireEvent.click(screen.getByRole("button", { name: "Retire this item" }));
    expect(fetchMock).not.toHaveBeenCalled();
    const confirm = screen.getByRole("button", { name: "Yes, retire QNS-7" });
    await waitFor(() => expect(document.activeElement).toBe(confirm));
    fireEvent.click(confirm);
    await waitFor(() => expect(push).toHaveBeenCalledWith("/counter?retired=QNS-7"));
    expect(fetchMock).toHaveBeenCalledWith("/api/v1/catalog/QNS-7", expect.objectContaining({ method: "DELETE" }));
  });

  it("keeps the item when the second step is declined", () => {
    render(<ItemRetire sku="QNS-7" />);
    fireEvent.click(screen.getByRole("button", { name: "Retire this item" }));
    fireEvent.click(screen.getByRole("button", { name: "Keep it" }));
    expect(screen.getByRole("button", { name: "Retire this item" })).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
