import type { TireSize } from "./types";

/** The families a replacement must stay within: passenger, light truck, ETRTO commercial, trailer, temporary spare. */
export type ServiceType = "passenger" | "LT" | "C" | "ST" | "T";

export function serviceType(size: Pick<TireSize, "kind" | "prefix" | "commercial">): ServiceType {
  if (size.prefix === "T") return "T";
  if (size.prefix === "ST") return "ST";
  if (size.prefix === "LT" || size.kind === "flotation") return "LT";
  if (size.commercial) return "C";
  return "passenger";
}
