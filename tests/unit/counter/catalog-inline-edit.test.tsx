// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { CatalogInlineEdit } from "@/components/counter/catalog-inline-edit";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh, push: vi.fn() }) }));

const fetchMock = vi.fn();
beforeEach(() => {
  refresh.mockReset();
  fetchMock.mockReset();
  vi.stubGlobal("fetch", fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const priceInput = () => screen.getByLabelText("Price of QNS-1 in dollars");

describe("the in-place price and quantity editor", () => {
  it("saves a new price on Enter as whole cents, says so, and refreshes the table", async () => {
    fetchMock.mockResolvedValue(new Response(JSON.stringify({ sku: "QNS-1" }), { status: 200 }));
    render(<CatalogInlineEdit sku="QNS-1" field="priceCents" value={18_999} label="Price of QNS-1 in dollars" />);
    expect(priceInput()).toHaveProperty("value", "189.99");
    fireEvent.change(priceInput(), { target: { value: "$1,204.5" } });
    fireEvent.submit(priceInput().closest("form")!);
    expect(screen.getByText("Saving…")).toBeTruthy();
    await waitFor(() => expect(screen.getByText(/^Price changed to \$1,204\.50/)).toBeTruthy());
    expect(fetchMock).toHaveBeenCalledWith("/api/v1/catalog/QNS-1", expect.objectContaining({ method: "PATCH", body: JSON.stringify({ priceCents: 120_450 }) }));
    expect(priceInput()).toHaveProperty("value", "1204.50");
    expect(refresh).toHaveBeenCalledTimes(1);
    // Leaving the field after Enter sends nothing more.
    fireEvent.blur(priceInput());
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it("offers Undo after a save, which puts the value before back through the API", async () => {
    fetchMock.mockImplementation(async () => new Response(JSON.stringify({ sku: "QNS-1" }), { status: 200 }));
    render(<CatalogInlineEdit sku="QNS-1" field="quantity" value={4} label="Quantity of QNS-1 on hand" />);
    const input = screen.getByLabelText("Quantity of QNS-1 on hand");
    fireEvent.change(input, { target: { value: "2" } });
    fireEvent.blur(input);
    await waitFor(() => expect(screen.getByText(/^Quantity changed to 2/)).toBeTruthy());
    fireEvent.click(screen.getByRole("button", { name: "Undo" }));
    await waitFor(() => expect(screen.getByText("Quantity back to 4")).toBeTruthy());
    expect(fetchMock.mock.calls.map(([, init]) => JSON.parse(init.body))).toEqual([{ quantity: 2 }, { quantity: 4 }]);
    expect(input).toHaveProperty("value", "4");
    expect(screen.queryByRole("button", { name: "Undo" })).toBeNull();
  });

  it("stops offering Undo a few seconds after the save", async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    try {
      fetchMock.mockResolvedValue(new Response(JSON.stringify({ sku: "QNS-1" }), { status: 200 }));
      render(<CatalogInlineEdit sku="QNS-1" field="priceCents" value={18_999} label="Price of QNS-1 in dollars" />);
      fireEvent.change(priceInput(), { target: { value: "182.99" } });
      fireEvent.blur(priceInput());
      await waitFor(() => expect(screen.getByRole("button", { name: "Undo" })).toBeTruthy());
      await vi.advanceTimersByTimeAsync(8_000);
      await waitFor(() => expect(screen.queryByRole("button", { name: "Undo" })).toBeNull());
    } finally {
      vi.useRealTimers();
    }
  });

  it("puts the value back on Escape and sends nothing", () => {
    render(<CatalogInlineEdit sku="QNS-1" field="priceCents" value={18_999} label="Price of QNS-1 in dollars" />);
    fireEvent.change(priceInput(), { target: { value: "99" } });
    fireEvent.keyDown(priceInput(), { key: "Escape" });
    expect(priceInput()).toHaveProperty("value", "189.99");
    fireEvent.blur(priceInput());
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("explains a value it cannot read, next to the field, without sending it", () => {
    render(<CatalogInlineEdit sku="QNS-1" field="quantity" value={4} label="Quantity of QNS-1 on hand" />);
    const input = screen.getByLabelText("Quantity of QNS-1 on hand");
    fireEvent.change(input, { target: { value: "-2" } });
    fireEvent.blur(input);
    expect(input.getAttribute("aria-invalid")).toBe("true");
    const describedBy = input.getAttribute("aria-describedby")!;
    expect(document.getElementById(describedBy)?.textContent).toBe("Enter a whole number, 0 or more.");
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the server's refusal and does not refresh", async () => {
    fetchMock.mockResolvedValue(new Response(JSON.stringify({ error: { code: "not_found", message: 'No current catalog item has the SKU "QNS-1".' } }), { status: 404 }));
    render(<CatalogInlineEdit sku="QNS-1" field="quantity" value={4} label="Quantity of QNS-1 on hand" />);
    const input = screen.getByLabelText("Quantity of QNS-1 on hand");
    fireEvent.change(input, { target: { value: "6" } });
    fireEvent.blur(input);
    await waitFor(() => expect(screen.getByText('No current catalog item has the SKU "QNS-1".')).toBeTruthy());
    expect(refresh).not.toHaveBeenCalled();
  });
});
