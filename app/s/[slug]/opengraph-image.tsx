import { ImageResponse } from "next/og";
import { drawnTireOf } from "@/components/reader/drawn-tire";
import { FactRows } from "@/components/share-image/fact-rows";
import { TireSketch } from "@/components/share-image/tire-sketch";
import { getDb } from "@/lib/database/app-database";
import { FIT_CARD_SLUG_PATTERN } from "@/lib/fit-cards/card-input";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { shareImageFonts, shareImageSize } from "@/lib/share-image/fonts";
import { formatPrice } from "@/lib/money/money";
import { compareSizes, formatLength, formatSignedPercent, measurableSizeFromSlug, sizeGeometry, type MeasurableSize } from "@/lib/tire";

export const size = shareImageSize;
export const contentType = "image/png";
export const alt = "The Fit card's sizes drawn over each other to scale, with their diameters and the lowest price";

export default async function FitCardShareImage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  if (!FIT_CARD_SLUG_PATTERN.test(slug)) return new Response("Not a Fit card", { status: 404 });
  const lookup = await readFitCard(await getDb(), slug);
  if (lookup.status !== "found") return new Response("No Fit card to show", { status: lookup.status === "missing" ? 404 : 410 });
  const { card } = lookup;
  const sizes = card.sizes.map(measurableSizeFromSlug).filter((tireSize): tireSize is MeasurableSize => tireSize !== null);
  const compared = compareSizes(sizes);
  const stocked = card.tires.filter((tire) => tire.stillStocked);
  const facts: [string, string][] = compared.map((entry, index) => [
    entry.designation,
    `${formatLength(entry.overallDiameterMm, "metric")} · ${formatLength(entry.overallDiameterMm, "imperial")}${index === 0 ? "" : ` · ${formatSignedPercent(entry.diameterDiffPct)}`}`,
  ]);
  if (stocked.length > 0) facts.push([`${stocked.length} ${stocked.length === 1 ? "tire" : "tires"} picked`, `from ${formatPrice(Math.min(...stocked.map((tire) => tire.priceCents)))}`]);
  return new ImageResponse(
    (
      <div style={{ display: "flex", width: "100%", height: "100%", background: "#f5f3ec", color: "#1b2129", fontFamily: "Plex", padding: 56 }}>
        <div style={{ display: "flex", alignItems: "center", justifyContent: "center", width: 520 }}>
          <TireSketch tires={sizes.map((tireSize) => drawnTireOf(tireSize, sizeGeometry(tireSize)))} sizePx={500} />
        </div>
        <div style={{ display: "flex", flexDirection: "column", justifyContent: "center", paddingLeft: 48, flex: 1 }}>
          <div style={{ fontSize: 28, color: "#244a9a", letterSpacing: 4 }}>SIDEWISE · FIT CARD</div>
          <div style={{ fontFamily: "Mono", fontSize: 60, fontWeight: 600, marginTop: 8 }}>{card.original.designation}</div>
          <FactRows facts={facts} fontSize={25} monoLabels />
        </div>
      </div>
    ),
    { ...shareImageSize, fonts: await shareImageFonts() },
  );
}
