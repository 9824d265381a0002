import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { PageIntro } from "@/components/ui/page-intro";

export const metadata: Metadata = { title: "Forgot your password?", robots: { index: false } };

export default function ForgotPasswordPage() {
  return (
    <section>
      <PageIntro eyebrow="Account" title="Forgot your password?">
        <p>Give the e-mail address you signed up with, and we&apos;ll send a link to choose a new password.</p>
      </PageIntro>
      <ForgotPasswordForm />
      <p className="mt-4">
        Remembered it?{" "}
        <Link href="/sign-in" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </section>
  );
}
