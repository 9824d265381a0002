import { describe, expect, it } from "vitest";
import { formatSize, parseMarking, serviceType, sizeFromSlug, sizeToSlug } from "@/lib/tire";

const designationOf = (text: string): string | null => {
  const r = parseMarking(text);
  return r.ok && r.size ? formatSize(r.size) : null;
};

describe("normalized designations (ISO 4000-1 / ETRTO and US P-metric, LT and flotation forms)", () => {
  it.each([
    ["285/50R20", "285/50R20"],
    ["lt265/75r16", "LT265/75R16"],
    ["265/75R16LT", "LT265/75R16"],
    ["P215/65R15", "P215/65R15"],
    ["215/65R16C", "215/65R16C"],
    ["245/40ZR18", "245/40ZR18"],
    ["245/40RF18", "245/40RF18"],
    ["245/40ZRF18", "245/40ZRF18"],
    ["33X12.50R15LT", "33x12.50R15LT"],
    ["31x10.5R15", "31x10.50R15"],
    ["35x12.50-20LT", "35x12.50D20LT"],
    ["205/75-15", "205/75D15"],
    ["205/75B15", "205/75B15"],
    ["155R13", "155R13"],
    ["185R14C", "185R14C"],
    ["T125/70D16", "T125/70D16"],
    ["ST225/75R15", "ST225/75R15"],
    ["LT215/85R16.5", "LT215/85R16.5"],
  ])("%s → %s", (input, expected) => {
    expect(designationOf(input)).toBe(expected);
  });
});

describe("URL slugs", () => {
  it.each([
    ["285/50R20", "285-50R20"],
    ["LT265/75R16", "LT265-75R16"],
    ["33x12.50R15LT", "33x12.50R15LT"],
    ["155R13", "155R13"],
  ])("%s ↔ %s", (designation, slug) => {
    const size = sizeFromSlug(designation);
    expect(size && sizeToSlug(size)).toBe(slug);
    expect(sizeFromSlug(slug)).toEqual(size);
  });

  it("refuses slugs that are more than a size, or not one", () => {
    expect(sizeFromSlug("285-50R20 116T")).toBeNull();
    expect(sizeFromSlug("garbage")).toBeNull();
    expect(sizeFromSlug("285-50R")).toBeNull();
  });
});

describe("service types", () => {
  it.each([
    ["P215/65R15", "passenger"],
    ["215/65R15", "passenger"],
    ["LT265/75R16", "LT"],
    ["33x12.50R15LT", "LT"],
    ["31x10.50R15", "LT"],
    ["215/65R16C", "C"],
    ["ST225/75R15", "ST"],
    ["T125/70D16", "T"],
  ])("%s is %s (common practice)", (text, type) => {
    const size = sizeFromSlug(text);
    expect(size && serviceType(size)).toBe(type);
  });
});
