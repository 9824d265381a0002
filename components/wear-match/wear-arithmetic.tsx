import { formatDepth32, formatDepth32Short as depth, formatOneDecimal, formatWearLimit, formatWornLength, MM_PER_32ND, type WearLimit, type WearMatch } from "@/lib/tire";
import { placeTires } from "./vehicle-from-above";

/** Every tire's depth, diameter and circumference, then the three comparisons that decide the verdict. */
export function WearArithmetic({ match, limit, limitFromShop }: { match: WearMatch; limit: WearLimit; limitFromShop: boolean }) {
  const depths = match.remaining.map((tire) => tire.depth32);
  const [shallowest, deepest] = [Math.min(...depths), Math.max(...depths)];
  const newDepth = match.newTire.depth32;
  const L = match.limit32;
  return (
    <section aria-labelledby="arithmetic-heading" className="flex flex-col gap-3">
      <h2 id="arithmetic-heading" className="text-xl font-semibold">
        The arithmetic
      </h2>
      <p className="text-ink-soft">
        A new tire&apos;s diameter is the size&apos;s nominal overall diameter (common practice). A worn tire is smaller by twice the tread it has
        lost, once above the wheel and once below: {formatOneDecimal(2 * MM_PER_32ND)} mm of diameter for every 32nd. The tires that stay are taken to have started at the new
        tire&apos;s {formatDepth32(newDepth)}. Circumference is π × diameter, unloaded.
      </p>
      <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-rule">
              <th scope="col" className="py-2 pr-3">Tire</th>
              <th scope="col" className="py-2 pr-3">Tread depth</th>
              <th scope="col" className="py-2 pr-3">Diameter</th>
              <th scope="col" className="py-2">Circumference</th>
            </tr>
          </thead>
          <tbody className="font-mono">
            {placeTires(match).map(({ corner, tire, isNew }) => (
              <tr key={corner} className="border-b border-grid">
                <th scope="row" className="py-2 pr-3 font-sans font-normal">
                  {corner}, {isNew ? (match.verdict === "shave" ? "new, shaved" : "new") : "stays"}
                </th>
                <td className="py-2 pr-3">{formatDepth32(tire.depth32)}</td>
                <td className="py-2 pr-3">{formatWornLength(tire.overallDiameterMm)}</td>
                <td className="py-2">{formatWornLength(tire.circumferenceMm)}</td>
              </tr>
            ))}
          </tbody>
      </table>
      <ol className="list-decimal space-y-1 pl-5">
        <li>
          The limit: {formatWearLimit(limit, L)}
          {limitFromShop ? ", the shop's default (the vehicle maker's own limit comes first)" : ""}.
        </li>
        <li>
          The tires that stay differ by {depth(deepest)} − {depth(shallowest)} = {depth(match.spread32)} in,{" "}
          {match.replaceReason === "spread" ? "more than the limit: replace the set." : "within the limit."}
        </li>
        <li>
          The new tire may be no shallower than {depth(deepest)} − {depth(L)} = {depth(deepest - L)} in
          {match.replaceReason === "newTooShallow" ? `: at ${depth(newDepth)} in it is, and shaving cannot add tread.` : ` and no deeper than ${depth(shallowest)} + ${depth(L)} = ${depth(shallowest + L)} in; it is ${depth(newDepth)} in.`}
        </li>
      </ol>
    </section>
  );
}
