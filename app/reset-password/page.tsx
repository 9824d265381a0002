import type { Metadata } from "next";
import Link from "next/link";
import { resetTokenSchema } from "@/components/auth/password-reset-schemas";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { PageIntro } from "@/components/ui/page-intro";

// The address carries the reset token: keep it out of search results and out of Referer headers.
export const metadata: Metadata = { title: "Choose a new password", robots: { index: false }, referrer: "no-referrer" };

// Rendered per request: the reset token comes in the address.
export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token, error } = await searchParams;
  const parsedToken = resetTokenSchema.safeParse(token);
  if (error !== undefined || !parsedToken.success) {
    return (
      <section>
        <PageIntro eyebrow="Account" title="This link no longer works">
          <p>
            {error === "INVALID_TOKEN"
              ? "The reset link has expired or was already used. Each link works once, for a limited time."
              : "This page needs the link from a password-reset e-mail, and this address has none."}
          </p>
        </PageIntro>
        <Link href="/forgot-password" className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-semibold text-sheet">
          Ask for a new link
        </Link>
      </section>
    );
  }
  return (
    <section>
      <PageIntro eyebrow="Account" title="Choose a new password">
        <p>Use at least 8 characters. Once it is set, you will sign in with it.</p>
      </PageIntro>
      <ResetPasswordForm token={parsedToken.data} />
    </section>
  );
}
