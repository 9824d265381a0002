import type { TireSize } from "./types";
import type { SERVICE_TYPES } from "./vocabulary";

export type ServiceType = (typeof SERVICE_TYPES)[number];

export function serviceType(size: Pick<TireSize, "kind" | "prefix" | "commercial">): ServiceType {
  if (size.prefix === "T") return "T";
  if (size.prefix === "ST") return "ST";
  if (size.prefix === "LT" || size.kind === "flotation") return "LT";
  if (size.commercial) return "C";
  return "passenger";
}
