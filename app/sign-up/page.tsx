import type { Metadata } from "next";
import Link from "next/link";
import { AuthForm } from "@/components/auth/auth-form";
import { PageIntro } from "@/components/ui/page-intro";
import { safeNextPath } from "@/lib/auth/next-path";

export const metadata: Metadata = { title: "Create an account" };

// Rendered per request: the page to return to comes in the address.
export default async function SignUpPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const next = safeNextPath((await searchParams).next);
  return (
    <section>
      <PageIntro eyebrow="Account" title="Create an account">
        <p>An account keeps your Fit cards and vehicles in one place.</p>
      </PageIntro>
      <AuthForm kind="sign-up" next={next}>
        <p>
          Already have an account?{" "}
          <Link href={`/sign-in?next=${encodeURIComponent(next)}`} className="font-semibold text-accent underline underline-offset-4">
            Sign in
          </Link>
        </p>
      </AuthForm>
    </section>
  );
}
