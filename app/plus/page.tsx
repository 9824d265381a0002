import type { Metadata } from "next";
import { ComingSoon } from "@/components/ui/coming-soon";

export const metadata: Metadata = { title: "Plus planner" };

export default function PlusPlannerPage() {
  return <ComingSoon title="Plus planner" summary="See which sizes on a smaller or larger wheel keep your overall diameter within tolerance." />;
}
