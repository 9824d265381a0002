import type { Metadata } from "next";
import { ComingSoon } from "@/components/ui/coming-soon";

export const metadata: Metadata = { title: "Counter" };

export default function CounterPage() {
  return <ComingSoon title="Counter" summary="The staff area: keep the catalog current and send Fit cards to customers." />;
}
