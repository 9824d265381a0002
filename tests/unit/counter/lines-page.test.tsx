// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { LinesBrandList } from "@/components/counter/lines-brand-list";
import { LinesBrandName } from "@/components/counter/lines-brand-name";
import { LinesLine } from "@/components/counter/lines-line";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ push: vi.fn(), refresh }) }));

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

const line = { id: 7, name: "Hollin Trail", season: "all-season", terrain: "all-terrain", threePeak: true, treadDepth32: 15, retired: false } as const;

describe("the Lines page", () => {
  it("says what to do when the shop has no brand yet", () => {
    render(<LinesBrandList brands={[]} />);
    expect(screen.getByRole("heading", { name: "No brands yet" })).toBeTruthy();
  });

  it("renames a brand in place: Escape leaves it, Enter sends it, a taken name is shown at the field", async () => {
    render(<LinesBrandName id={3} name="Orvelle" headingId="brand-3-name" />);
    fireEvent.click(screen.getByRole("button", { name: "Rename Orvelle" }));
    const field = screen.getByLabelText("New name for Orvelle");
    fireEvent.keyDown(field, { key: "Escape" });
    await waitFor(() => expect(document.activeElement).toBe(screen.getByRole("button", { name: "Rename Orvelle" })));
    expect(fetchMock).not.toHaveBeenCalled();

    fetchMock.mockResolvedValue(new Response(JSON.stringify({ error: { code: "already_exists", message: "Another brand is already called “Quensal”.", field: "name" } }), { status: 409 }));
    fireEvent.click(screen.getByRole("button", { name: "Rename Orvelle" }));
    fireEvent.change(screen.getByLabelText("New name for Orvelle"), { target: { value: "quensal" } });
    fireEvent.submit(screen.getByLabelText("New name for Orvelle").closest("form")!);
    await waitFor(() => expect(screen.getByText("Another brand is already called “Quensal”.")).toBeTruthy());
    expect(fetchMock).toHaveBeenCalledWith("/api/v1/brands/3", expect.objectContaining({ method: "PATCH", body: JSON.stringify({ name: "quensal" }) }));
    expect(screen.getByLabelText("New name for Orvelle").getAttribute("aria-invalid")).toBe("true");
  });

  it("retires a line with one press and says how to undo it", async () => {
    fetchMock.mockResolvedValue(new Response(JSON.stringify({ ...line, brandId: 3, retired: true }), { status: 200 }));
    render(<LinesLine line={line} brandName="Orvelle" />);
    expect(screen.getByText("all-season · all-terrain · 3PMSF · 15/32 in new")).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Retire Orvelle Hollin Trail" }));
    await waitFor(() => expect(screen.getByRole("status").textContent).toMatch(/^Retired Orvelle Hollin Trail: it takes no new items.*Un-retire it to add items again\.$/));
    expect(fetchMock).toHaveBeenCalledWith("/api/v1/lines/7", expect.objectContaining({ method: "PATCH", body: JSON.stringify({ retired: true }) }));
    expect(refresh).toHaveBeenCalled();
  });
});
