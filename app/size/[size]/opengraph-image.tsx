import { ImageResponse } from "next/og";
import { drawnTireOf } from "@/components/reader/drawn-tire";
import { FactRows } from "@/components/share-image/fact-rows";
import { TireSketch } from "@/components/share-image/tire-sketch";
import { shareImageFonts, shareImageSize } from "@/lib/share-image/fonts";
import { commonSizeParams, readSizeSheet } from "@/lib/size-sheet/read-size-sheet";
import { formatLength, formatRevolutions } from "@/lib/tire";

export const size = shareImageSize;
export const contentType = "image/png";
export const alt = "The tire size drawn to scale with its overall diameter, width and revolutions per mile";

// Like the Size sheet: the common sizes drawn at build, any other size at its first request, then
// served from the server's cache; a 404 is never stored.
export const dynamicParams = true;

export function generateStaticParams(): { size: string }[] {
  return commonSizeParams();
}

export default async function SizeShareImage({ params }: { params: Promise<{ size: string }> }) {
  const sheet = readSizeSheet((await params).size);
  if (!sheet) return new Response("Not a tire size", { status: 404 });
  const { geometry, size: tireSize, designation } = sheet;
  const facts: [string, string][] = !geometry
    ? [
        ["Section width", `${formatLength(tireSize.sectionWidthMm, "imperial")} · ${formatLength(tireSize.sectionWidthMm, "metric")}`],
        ["Rim", `${tireSize.rimDiameterIn} in`],
        ["Overall diameter", "from the maker's data"],
      ]
    : [
    ["Overall diameter", `${formatLength(geometry.overallDiameterMm, "metric")} · ${formatLength(geometry.overallDiameterMm, "imperial")}`],
    ["Section width", `${formatLength(geometry.sectionWidthMm, "metric")} · ${formatLength(geometry.sectionWidthMm, "imperial")}`],
    ["Sidewall", `${formatLength(geometry.sidewallMm, "metric")} · ${formatLength(geometry.sidewallMm, "imperial")}`],
    ["Revolutions", formatRevolutions(geometry.revsPerKm, geometry.revsPerMile, "imperial")],
  ];
  return new ImageResponse(
    (
      <div style={{ display: "flex", width: "100%", height: "100%", background: "#f5f3ec", color: "#1b2129", fontFamily: "Plex", padding: 56 }}>
        {geometry ? (
          <div style={{ display: "flex", alignItems: "center", justifyContent: "center", width: 520 }}>
            <TireSketch tires={[drawnTireOf(tireSize, geometry)]} sizePx={500} />
          </div>
        ) : null}
        <div style={{ display: "flex", flexDirection: "column", justifyContent: "center", paddingLeft: 48, flex: 1 }}>
          <div style={{ fontSize: 28, color: "#244a9a", letterSpacing: 4 }}>SIDEWISE · SIZE SHEET</div>
          <div style={{ fontFamily: "Mono", fontSize: designation.length > 10 ? 58 : 76, fontWeight: 600, marginTop: 8 }}>{designation}</div>
          <FactRows facts={facts} fontSize={27} />
        </div>
      </div>
    ),
    { ...shareImageSize, fonts: await shareImageFonts() },
  );
}
