import type { Metadata } from "next";
import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";

export const metadata: Metadata = { title: "Counter", robots: { index: false } };

const tasks = [
  "Add a stock item to a line the catalog has: POST /api/v1/catalog.",
  "Change an item's price, quantity or description: PATCH /api/v1/catalog/{sku}.",
  "Retire an item, so that it leaves the finder but keeps its history: DELETE /api/v1/catalog/{sku}.",
];

export default async function CounterPage() {
  const access = await requirePageUser("/counter", "staff");
  if (!access.allowed) {
    return (
      <section>
        <PageIntro eyebrow="403 · Not for this account" title="The Counter is for shop staff">
          <p>
            You are signed in as {access.user.email}, a {access.user.role} account. Ask the shop if you should have staff
            access.
          </p>
        </PageIntro>
        <Link href="/account" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Go to your account
        </Link>
      </section>
    );
  }
  return (
    <section>
      <PageIntro eyebrow="Staff" title="Counter">
        <p>Keep the shop&apos;s catalog current. Signed in as {access.user.name} ({access.user.role}).</p>
      </PageIntro>
      <h2 className="text-xl font-semibold">What you can do here</h2>
      <ul className="mt-3 max-w-3xl list-disc space-y-2 pl-6">
        {tasks.map((task) => (
          <li key={task}>{task}</li>
        ))}
      </ul>
      <p className="mt-6 text-ink-soft">The catalog table, CSV import and export, and sending Fit cards will appear here.</p>
    </section>
  );
}
