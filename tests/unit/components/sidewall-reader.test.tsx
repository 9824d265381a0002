// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { SidewallReader } from "@/components/reader/sidewall-reader";
import { parseMarking } from "@/lib/tire/parse/parse-marking";

vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: React.ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));

beforeEach(() => window.localStorage.clear());
afterEach(cleanup);

// As the page does: the text in the address comes read by the server.
function renderReader(text: string) {
  render(<SidewallReader initialText={text} initialResult={parseMarking(text, { today: new Date() })} />);
}

// The reader is fetched at the first edit, so what is read after typing is awaited.
function typeInto(text: string) {
  fireEvent.change(screen.getByLabelText("Type or paste what's on your sidewall"), { target: { value: text } });
}

describe("the Sidewall reader", () => {
  it("shows the server's reading of the address's text before any edit", () => {
    renderReader("285/50R20 119S");
    expect(screen.getByText(/Read as/).textContent).toContain("285/50R20 119S");
  });


  it("decodes as it is typed and shows metric figures", async () => {
    window.localStorage.setItem("sidewise:units", "metric");
    renderReader("");
    typeInto("285/50R20 119S");
    expect((await screen.findByText(/Read as/)).textContent).toContain("285/50R20 119S");
    const table = screen.getAllByRole("table")[0]!;
    expect(within(table).getByText("Overall diameter").closest("tr")?.textContent).toContain("793 mm");
    // Load index 119 = 1,360 kg (ISO 4000-1 load-index table).
    expect(screen.getByText(/carries up to 1,360 kg per tire/)).toBeTruthy();
  });

  it("switches every figure to imperial and remembers the choice", () => {
    window.localStorage.setItem("sidewise:units", "metric");
    renderReader("285/50R20 119S");
    fireEvent.click(screen.getByLabelText("Imperial"));
    const table = screen.getAllByRole("table")[0]!;
    expect(within(table).getByText("Overall diameter").closest("tr")?.textContent).toContain("31.2 in");
    expect(screen.getByText(/carries up to 2,998 lb per tire/)).toBeTruthy();
    expect(screen.queryByText(/ mm$/)).toBeNull();
    expect(window.localStorage.getItem("sidewise:units")).toBe("imperial");
  });

  it("explains what is missing when nothing can be read", async () => {
    renderReader("");
    typeInto("285/50R");
    expect((await screen.findByRole("alert")).textContent).toMatch(/rim diameter/i);
  });

  it("decodes a DOT code on its own, without a drawing", async () => {
    renderReader("");
    typeInto("DOT 4B7X 2HRT 1523");
    expect(await screen.findByText(/made in week 15 of 2023/)).toBeTruthy();
    expect(screen.queryByRole("img")).toBeNull();
  });

  it("fills the input from an example chip", async () => {
    renderReader("");
    fireEvent.click(screen.getByRole("button", { name: "245/40ZR18 97Y XL" }));
    expect((screen.getByLabelText("Type or paste what's on your sidewall") as HTMLInputElement).value).toBe("245/40ZR18 97Y XL");
    expect(await screen.findByText(/Extra Load: reinforced/)).toBeTruthy();
  });

  it("links onward with the size, load index (single and dual) and speed symbol filled in", () => {
    renderReader("LT265/75R16 123/120S Load Range E");
    const finder = screen.getByRole("link", { name: /Replacement finder/ });
    expect(finder.getAttribute("href")).toBe("/replace?size=LT265-75R16&loadIndex=123&loadIndexDual=120&speedSymbol=S&loadRange=E");
  });

  it("links a truck size (11R22.5) only to its Size sheet: the finder, Plus planner and Side-by-side need an overall diameter", () => {
    renderReader("11R22.5 146/143L");
    expect(screen.getByRole("link", { name: /Size sheet/ }).getAttribute("href")).toBe("/size/11R22.5");
    expect(screen.queryByRole("link", { name: /Replacement finder/ })).toBeNull();
    expect(screen.getByText(/No overall diameter for 11R22\.5/)).toBeTruthy();
  });

  it("explains a flotation size: the first number is the overall diameter in inches, the width is in inches (flotation designation)", () => {
    window.localStorage.setItem("sidewise:units", "metric");
    renderReader("33x12.50R15LT 108Q C");
    const card = (title: string) => screen.getByRole("button", { name: title }).closest("li")!;
    expect(card("Overall diameter").textContent).toMatch(/first number is the tire's overall diameter in inches/);
    expect(card("Overall diameter").textContent).toContain("33 in (838 mm) tall overall");
    expect(card("Section width").textContent).toMatch(/section width in inches, not millimetres/);
    expect(screen.queryByRole("button", { name: "Aspect ratio" })).toBeNull();
  });

  it("warns on the rim card that 16- and 16.5-inch tires and wheels never interchange (common practice)", () => {
    renderReader("LT235/85R16 120/116Q E");
    const rim = screen.getByRole("button", { name: "Rim diameter" }).closest("li")!;
    expect(rim.textContent).toContain("never 16.5-inch ones");
    expect(rim.textContent).toContain("16- and 16.5-inch tires and wheels never interchange: a bead seated on the wrong rim diameter can burst while being seated");
  });

  it("keeps the capitals of DOT, TIN, UTQG and XL in its More about links", () => {
    renderReader("245/40ZR18 97Y XL DOT 4B7X 2HRT 1523 500 A A");
    expect(screen.getByRole("link", { name: "More about DOT code (TIN)" }).getAttribute("href")).toBe("/learn/dot-code");
    expect(screen.getByRole("link", { name: "More about UTQG grades" })).toBeTruthy();
    expect(screen.getByRole("link", { name: "More about extra load (XL)" })).toBeTruthy();
    expect(screen.getByRole("link", { name: "More about load index" })).toBeTruthy();
  });

  it("reads a trailer tire's load range without a warning (TRA, common practice: D is 8-ply)", () => {
    renderReader("ST205/75R15 107/102M D");
    expect(screen.getByText("load range D")).toBeTruthy();
    expect(screen.queryByText(/Not read/)).toBeNull();
  });
});
