// @vitest-environment jsdom
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { TireDrawing } from "@/components/diagram/tire-drawing";
import { drawnTireOf } from "@/components/reader/drawn-tire";
import { parseMarking, type Marking } from "@/lib/tire";

afterEach(cleanup);

function tireFor(text: string) {
  const result = parseMarking(text);
  if (!result.ok || !result.size || !result.geometry) throw new Error(`could not read ${text}`);
  return { tire: drawnTireOf(result.size, result.geometry), geometry: (result as Marking).geometry! };
}

function numberAttr(element: Element | null, name: string): number {
  // Framer Motion writes rectangle sizes as "285px": in SVG, px are user units, here millimetres.
  return Number.parseFloat(element?.getAttribute(name) ?? "NaN");
}

describe.each(["row", "column"] as const)("the tire drawing, %s arrangement", (arrangement) => {
  it("draws circles and the cross-section in millimetres, exactly as computed", () => {
    const { tire, geometry } = tireFor("285/50R20");
    const { container } = render(<TireDrawing tires={[tire]} units="metric" title="t" description="d" arrangement={arrangement} />);
    // 285/50R20: overall 793 mm, rim 508 mm, section 285 mm, sidewall 142.5 mm (nominal geometry).
    expect(numberAttr(container.querySelector('[data-part="overall"]'), "r")).toBeCloseTo(geometry.overallDiameterMm / 2, 6);
    expect(numberAttr(container.querySelector('[data-part="rim"]'), "r")).toBeCloseTo(geometry.rimDiameterMm / 2, 6);
    const section = container.querySelector('[data-part="section"]');
    expect(numberAttr(section, "width")).toBeCloseTo(285, 6);
    expect(numberAttr(section, "height")).toBeCloseTo(142.5, 6);
  });

  it("keeps two sizes in proportion to each other on one scale", () => {
    const small = tireFor("205/55R16").tire;
    const large = tireFor("275/40R20").tire;
    const { container } = render(<TireDrawing tires={[small, large]} units="metric" title="t" description="d" arrangement={arrangement} />);
    const [first, second] = [...container.querySelectorAll('[data-part="overall"]')].map((circle) => numberAttr(circle, "r"));
    expect(second! / first!).toBeCloseTo(large.overallDiameterMm / small.overallDiameterMm, 6);
  });

  it("labels its dimension lines in the chosen units", () => {
    const { tire } = tireFor("285/50R20");
    const metric = render(<TireDrawing tires={[tire]} units="metric" title="t" description="d" arrangement={arrangement} />);
    expect(metric.container.querySelector('[data-dimension="overall"] text')?.textContent).toBe("793 mm");
    cleanup();
    const imperial = render(<TireDrawing tires={[tire]} units="imperial" title="t" description="d" arrangement={arrangement} />);
    expect(imperial.container.querySelector('[data-dimension="overall"] text')?.textContent).toBe("31.2 in");
  });

  it("has an accessible name and description", () => {
    const { tire } = tireFor("205/55R16");
    const { getByRole } = render(
      <TireDrawing tires={[tire]} units="metric" title="205/55R16 drawn to scale" description="Side view and cross-section" arrangement={arrangement} />,
    );
    const image = getByRole("img");
    expect(image.getAttribute("aria-labelledby")?.split(" ")).toHaveLength(2);
    expect(image.querySelector("title")?.textContent).toBe("205/55R16 drawn to scale");
  });
});
