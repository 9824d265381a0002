// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SaveFitCard } from "@/components/fit-card/save-fit-card-button";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** Renders the control with the sign-in service answering `user` (null: nobody signed in). */
async function renderFor(user: { name: string; role: string } | null) {
  vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify(user ? { user } : null), { headers: { "content-type": "application/json" } })));
  window.history.replaceState(null, "", "/compare?sizes=225-45R17%2C235-40R18");
  await act(async () => {
    render(<SaveFitCard draft={{ sizes: ["225/45R17", "235/40R18"] }} />);
  });
}

describe("Save as Fit card, by who is looking", () => {
  it.each(["customer", "staff", "admin"])("a signed-in %s may save a card", async (role) => {
    await renderFor({ name: "Rosa Iverley", role });
    expect(screen.getByRole("button", { name: "Save as Fit card" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Copy link" })).toBeNull();
  });

  it("offers a signed-out visitor the page's link and a sign-in that comes back here, and no form", async () => {
    await renderFor(null);
    expect(screen.queryByRole("button", { name: "Save as Fit card" })).toBeNull();
    expect(screen.queryByRole("form")).toBeNull();
    expect(screen.getByRole("link", { name: "Sign in to save a Fit card" }).getAttribute("href")).toBe(
      `/sign-in?next=${encodeURIComponent("/compare?sizes=225-45R17%2C235-40R18")}`,
    );
  });

  it("says the link was copied, or shows it to copy by hand when the browser refuses", async () => {
    await renderFor(null);
    const writeText = vi.fn(async () => undefined);
    vi.stubGlobal("navigator", { clipboard: { writeText } });
    await act(async () => fireEvent.click(screen.getByRole("button", { name: "Copy link" })));
    expect(writeText).toHaveBeenCalledWith(window.location.href);
    expect(screen.getByRole("status").textContent).toBe("Link copied.");

    writeText.mockRejectedValueOnce(new Error("refused"));
    await act(async () => fireEvent.click(screen.getByRole("button", { name: "Copy link" })));
    expect(screen.getByRole("status").textContent).toBe(`The browser did not allow copying. Copy this link: ${window.location.href}`);
  });

  it("shows only an empty line of the button's height while the session loads", async () => {
    vi.stubGlobal("fetch", vi.fn(() => new Promise<Response>(() => undefined)));
    const { container } = render(<SaveFitCard draft={{ sizes: ["225/45R17"] }} />);
    expect(container.textContent).toBe("");
    expect(container.firstElementChild?.getAttribute("aria-hidden")).toBe("true");
  });

  it("gives an account of a role it does not know the link only", async () => {
    await renderFor({ name: "Pat", role: "visitor" });
    expect(screen.queryByRole("button", { name: "Save as Fit card" })).toBeNull();
    expect(screen.getByRole("button", { name: "Copy link" })).toBeTruthy();
    expect(screen.queryByRole("link", { name: "Sign in to save a Fit card" })).toBeNull();
  });
});
