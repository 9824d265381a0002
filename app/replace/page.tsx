import type { Metadata } from "next";
import { ComingSoon } from "@/components/ui/coming-soon";

export const metadata: Metadata = { title: "Replacement finder" };

export default function ReplacementFinderPage() {
  return <ComingSoon title="Replacement finder" summary="Find equal-or-better tires from the shop's stock: same rim, load index and speed rating at least as high." />;
}
