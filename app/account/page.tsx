import type { Metadata } from "next";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";

export const metadata: Metadata = { title: "Your account", robots: { index: false } };

export default async function AccountPage() {
  const { user } = await requirePageUser("/account", "customer");
  return (
    <section>
      <PageIntro eyebrow="Account" title="Your account" />
      <dl className="grid max-w-md grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded border border-rule bg-sheet p-4">
        <dt className="font-semibold">Name</dt>
        <dd>{user.name}</dd>
        <dt className="font-semibold">E-mail</dt>
        <dd className="break-all">{user.email}</dd>
        <dt className="font-semibold">Role</dt>
        <dd>{user.role}</dd>
      </dl>
      <p className="mt-6 text-ink-soft">Fit cards and vehicles will appear here.</p>
    </section>
  );
}
