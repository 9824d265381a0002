import type { DrawnTire } from "@/components/diagram/drawing-layout";

/** A share image's drawing: side views to one scale, overlaid, each in its own line style. */
export function TireSketch({ tires, sizePx }: { tires: readonly DrawnTire[]; sizePx: number }) {
  const largest = Math.max(...tires.map((tire) => tire.overallDiameterMm));
  const frame = largest * 1.08;
  const centre = frame / 2;
  const dashes = [undefined, "18 10", "4 8", "22 8 4 8"];
  return (
    <svg width={sizePx} height={sizePx} viewBox={`0 0 ${frame} ${frame}`}>
      {tires.map((tire, index) => (
        <g key={tire.id}>
          <circle cx={centre} cy={centre} r={tire.overallDiameterMm / 2} fill={index === 0 ? "#1b2129" : "none"} fillOpacity={0.14} stroke="#1b2129" strokeWidth={index === 0 ? 8 : 5} strokeDasharray={dashes[index]} />
          <circle cx={centre} cy={centre} r={tire.rimDiameterMm / 2} fill={index === 0 ? "#fbfaf6" : "none"} stroke="#244a9a" strokeWidth={5} strokeDasharray={dashes[index]} />
        </g>
      ))}
      <line x1={centre} y1={0} x2={centre} y2={frame} stroke="#1b2129" strokeOpacity={0.35} strokeWidth={3} strokeDasharray="24 6 4 6" />
    </svg>
  );
}
