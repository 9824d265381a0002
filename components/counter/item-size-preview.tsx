import { formatLength, formatSize, hasNominalDiameter, noDiameterMessage, serviceType, sizeFromSlug, sizeGeometry } from "@/lib/tire";

const SERVICE_NAMES = { passenger: "passenger", LT: "light truck (LT)", C: "commercial (C)", ST: "special trailer (ST)", T: "temporary spare (T)" } as const;

/** What the tire core reads in the size field while it is typed: the stored designation and its diameter. */
export function ItemSizePreview({ id, text }: { id: string; text: string }) {
  const size = text.trim() === "" ? null : sizeFromSlug(text.trim());
  const geometry = size && hasNominalDiameter(size) ? sizeGeometry(size) : null;
  return (
    <p id={id} aria-live="polite" className="min-h-5 text-sm text-ink-soft">
      {size && geometry ? (
        <>
          Reads as <span className="font-mono font-semibold text-ink">{formatSize(size)}</span> · {SERVICE_NAMES[serviceType(size)]} · overall
          diameter {formatLength(geometry.overallDiameterMm, "metric")} ({formatLength(geometry.overallDiameterMm, "imperial")})
        </>
      ) : size ? (
        `${noDiameterMessage(size)} The catalog cannot hold it.`
      ) : text.trim() === "" ? (
        "Type the size as marked, like 225/45R17 or LT265/75R16."
      ) : (
        "Not a size yet: type it as marked, like 225/45R17."
      )}
    </p>
  );
}
