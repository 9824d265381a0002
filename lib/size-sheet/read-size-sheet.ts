import { COMMON_SIZES, formatLength, formatSize, type Geometry, type Marking, parseMarking, sizeFromSlug, sizeToSlug, type TireSize } from "@/lib/tire";

export interface SizeSheetData {
  size: TireSize;
  /** Null for an inch-width size (11R22.5), whose marking gives no overall diameter. */
  geometry: Geometry | null;
  marking: Marking;
  designation: string;
  /** The one spelling of this size in URLs: /size/285-50R20. */
  slug: string;
  summary: string;
}

function decodeSegment(segment: string): string {
  try {
    return decodeURIComponent(segment);
  } catch {
    return segment;
  }
}

/** Everything the Size sheet and its share image show, or null when the URL segment is not a size. */
export function readSizeSheet(segment: string): SizeSheetData | null {
  const size = sizeFromSlug(decodeSegment(segment).slice(0, 64));
  if (!size) return null;
  const designation = formatSize(size);
  const marking = parseMarking(designation);
  if (!marking.ok) return null;
  const geometry = marking.geometry;
  if (!geometry) {
    const summary = `${designation}: ${formatLength(size.sectionWidthMm, "imperial")} (${formatLength(size.sectionWidthMm, "metric")}) wide, for ${size.rimDiameterIn}-inch wheels; its overall diameter comes from the tire maker's data.`;
    return { size, geometry, marking, designation, slug: sizeToSlug(size), summary };
  }
  const summary =
    `${designation}: ${formatLength(geometry.sectionWidthMm, "metric")} wide, ` +
    `${formatLength(geometry.overallDiameterMm, "metric")} (${formatLength(geometry.overallDiameterMm, "imperial")}) tall, ` +
    `for ${size.rimDiameterIn}-inch wheels, ${Math.round(geometry.revsPerMile)} revolutions per mile.`;
  return { size, geometry, marking, designation, slug: sizeToSlug(size), summary };
}

/** The one URL spelling of each common size: the Size sheets the sitemap lists and the build renders. */
export function commonSizeSlugs(): string[] {
  return COMMON_SIZES.flatMap((designation) => {
    const size = sizeFromSlug(designation);
    return size ? [sizeToSlug(size)] : [];
  });
}

/** generateStaticParams of the Size sheet and its share image: the common sizes, rendered at build. */
export function commonSizeParams(): { size: string }[] {
  return commonSizeSlugs().map((size) => ({ size }));
}
