import type { Metadata } from "next";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";

export const metadata: Metadata = { title: "Counter", robots: { index: false } };

export default async function CounterPage() {
  const access = await requirePageUser("/counter", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  return (
    <section>
      <PageIntro eyebrow="Staff" title="Catalog">
        <p>Keep the shop&apos;s catalog current. Signed in as {access.user.name} ({access.user.role}).</p>
      </PageIntro>
    </section>
  );
}
