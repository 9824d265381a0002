import type { Metadata } from "next";
import { ComingSoon } from "@/components/ui/coming-soon";

export const metadata: Metadata = { title: "Sidewall school" };

export default function SidewallSchoolPage() {
  return <ComingSoon title="Sidewall school" summary="Plain-words lessons on every marking: load index, speed symbols, load range, the DOT code, UTQG and winter marks." />;
}
