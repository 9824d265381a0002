// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import QuoteForm from "@/components/quotes/quote-form";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** Renders the form and lets it fetch its signed opening time. */
async function renderForm() {
  await act(async () => {
    render(<QuoteForm context={{ source: "size-sheet", reference: "235/65R17" }} tires="235/65R17" onCancel={() => undefined} />);
  });
}

function fillIn() {
  fireEvent.change(screen.getByLabelText("Your name"), { target: { value: "Rosa Iverley" } });
  fireEvent.change(screen.getByLabelText("E-mail (the answer goes here)"), { target: { value: "rosa@example.test" } });
  fireEvent.change(screen.getByLabelText("Vehicle"), { target: { value: "2019 family SUV" } });
}

async function send() {
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Send the request" }));
  });
}

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

/** The server: a signed opening time for the form, then this answer to the request. */
function answer(status: number, body: unknown) {
  const fetchMock = vi.fn(async (url: string) => (url.endsWith("/form-token") ? json(200, { renderedAt: "1800000000000.signed" }) : json(status, body)));
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

const sends = (fetchMock: ReturnType<typeof answer>) => fetchMock.mock.calls.filter(([url]) => url === "/api/v1/quote-requests");

describe("the Ask the shop form", () => {
  it("marks each wrong field, reads its message with it, and puts the focus on the first", async () => {
    const fetchMock = answer(201, { id: 1, status: "new" });
    await renderForm();
    fireEvent.change(screen.getByLabelText("E-mail (the answer goes here)"), { target: { value: "rosa.example.test" } });
    await send();
    const name = screen.getByLabelText("Your name");
    expect(name.getAttribute("aria-invalid")).toBe("true");
    await waitFor(() => expect(document.activeElement).toBe(name));
    const email = screen.getByLabelText("E-mail (the answer goes here)");
    expect(document.getElementById(email.getAttribute("aria-describedby")!)?.textContent).toBe("Check the e-mail address: it should look like name@example.com");
    expect(screen.getByLabelText("Phone (optional)").getAttribute("aria-invalid")).toBeNull();
    expect(sends(fetchMock)).toHaveLength(0);
  });

  it("keeps the spam trap out of reach: out of the tab order, not autofilled, and labelled to stay empty", async () => {
    answer(201, { id: 1, status: "new" });
    await renderForm();
    const trap = screen.getByLabelText("Leave this field empty: it is only here to catch automated spam");
    expect(trap.getAttribute("tabindex")).toBe("-1");
    expect(trap.getAttribute("autocomplete")).toBe("off");
    expect(trap.closest(".sr-only")).not.toBeNull();
  });

  it("sends the request with the page's source and the signed time the form opened, then says what happens next", async () => {
    const fetchMock = answer(201, { id: 17, status: "new" });
    await renderForm();
    fillIn();
    await send();
    const [, init] = sends(fetchMock)[0] as unknown as [string, RequestInit];
    const body = JSON.parse(String(init.body));
    expect(body).toMatchObject({ source: "size-sheet", reference: "235/65R17", tires: "235/65R17", quantity: 4, website: "" });
    expect(body.renderedAt).toBe("1800000000000.signed");
    expect(screen.getByRole("status").textContent).toContain("Your request is with the shop (number 17).");
    expect(screen.getByRole("status").textContent).toContain("A confirmation is on its way to rosa@example.test.");
  });

  it("shows the server's refusal in plain words when too many requests were sent", async () => {
    const message = "Too many requests were sent from here in a short time. Please try again in 10 minutes, or call the shop.";
    answer(429, { error: { code: "rate_limited", message } });
    await renderForm();
    fillIn();
    await send();
    const alert = screen.getByRole("alert");
    expect(alert.textContent).toBe(message);
    await waitFor(() => expect(document.activeElement).toBe(alert));
  });

  it("names the page's catalog tires with how many are on hand against the number asked for, and sends their SKUs", async () => {
    const fetchMock = answer(201, { id: 18, status: "new" });
    const catalogTires = [
      { sku: "QX-1", label: "Quensal Aldermoor Tour 225/65R17 102H", quantity: 6 },
      { sku: "BX-2", label: "Bexford Ridge HT 225/65R17 102H", quantity: 2 },
      { sku: "OK-3", label: "Okenby Trail 225/65R17 106T", quantity: 0 },
    ];
    await act(async () => {
      render(<QuoteForm context={{ source: "finder", skus: ["QX-1", "BX-2", "OK-3"] }} tires="Replacing 225/65R17 102H" catalogTires={catalogTires} quantity={4} onCancel={() => undefined} />);
    });
    const words = () => [...document.querySelectorAll("[data-stock]")].map((line) => line.textContent);
    expect(screen.getByRole("heading", { name: "On hand at the shop now, for 4 tires" })).toBeTruthy();
    expect(words()).toEqual(["6 on hand", "2 on hand — fewer than the 4 you need", "none on hand: ask the shop"]);
    fireEvent.change(screen.getByLabelText("How many tires (1–16)"), { target: { value: "2" } });
    expect(words()).toEqual(["6 on hand", "2 on hand", "none on hand: ask the shop"]);
    fireEvent.change(screen.getByLabelText("How many tires (1–16)"), { target: { value: "8" } });
    expect(words()[0]).toBe("6 on hand — fewer than the 8 you need");
    fillIn();
    await send();
    const [, init] = sends(fetchMock)[0] as unknown as [string, RequestInit];
    expect(JSON.parse(String(init.body))).toMatchObject({ source: "finder", quantity: 8, skus: ["QX-1", "BX-2", "OK-3"] });
  });
});
