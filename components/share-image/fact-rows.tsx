/** A share image's label–value rows, drawn as ruled lines (next/og lays out with flexbox only). */
export function FactRows({ facts, fontSize, monoLabels = false }: { facts: readonly (readonly [string, string])[]; fontSize: number; monoLabels?: boolean }) {
  return (
    <div style={{ display: "flex", flexDirection: "column", marginTop: 24 }}>
      {facts.map(([label, value]) => (
        <div key={label} style={{ display: "flex", justifyContent: "space-between", borderTop: "2px solid #d8d3c4", padding: "11px 0", fontSize }}>
          <span style={{ color: "#4a5361", fontFamily: monoLabels ? "Mono" : "Plex" }}>{label}</span>
          <span style={{ fontFamily: "Mono", fontWeight: 600 }}>{value}</span>
        </div>
      ))}
    </div>
  );
}
