import { LB_PER_KG } from "@/lib/tire";

/** Why the school shows two units at once, and how the pounds are worked out. */
export function UnitsNote() {
  return (
    <>
      Metric and US units side by side: kilograms and pounds, km/h and mph, kPa and psi, millimetres and inches. Pounds are kilograms ×{" "}
      {LB_PER_KG}, rounded, as load tables print them.
    </>
  );
}
