// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SizeParts } from "@/components/size-sheet/size-parts";
import { parseMarking, type Marking } from "@/lib/tire";

vi.mock("next/link", () => ({
  default: ({ href, children, ...rest }: { href: string; children: React.ReactNode }) => (
    <a href={href} {...rest}>
      {children}
    </a>
  ),
}));

afterEach(cleanup);

function marking(text: string): Marking {
  const read = parseMarking(text);
  if (!read.ok) throw new Error(read.error.message);
  return read;
}

const card = (title: string) => screen.getByText(title, { selector: "dt" }).parentElement!;

describe("the Size sheet's parts", () => {
  it("explain a flotation size in inches and the half-inch rim it must never be mixed with (common practice)", () => {
    render(<SizeParts marking={marking("33x12.50R16.5LT")} />);
    expect(card("Overall diameter").textContent).toMatch(/first number is the tire's overall diameter in inches/);
    expect(card("Section width").textContent).toMatch(/section width in inches, not millimetres/);
    expect(card("Rim diameter").textContent).toContain("fits 16.5-inch wheels only, never 16-inch ones");
    expect(card("Rim diameter").textContent).toContain("16- and 16.5-inch tires and wheels never interchange");
    expect(screen.getByRole("link", { name: "More about overall diameter" }).getAttribute("href")).toBe("/learn/overall-diameter");
  });

  it("keep the rim card plain for a rim with no half-inch twin", () => {
    render(<SizeParts marking={marking("285/50R20")} />);
    expect(card("Rim diameter").textContent).not.toContain("interchange");
    expect(screen.getByRole("link", { name: "More about aspect ratio" })).toBeTruthy();
  });
});
