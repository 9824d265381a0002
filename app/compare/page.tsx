import type { Metadata } from "next";
import { ComingSoon } from "@/components/ui/coming-soon";

export const metadata: Metadata = { title: "Side-by-side" };

export default function SideBySidePage() {
  return <ComingSoon title="Side-by-side" summary="Draw up to four sizes over each other and see what changes: diameter, sidewall, speedometer and clearance." />;
}
