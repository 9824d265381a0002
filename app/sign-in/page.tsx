import type { Metadata } from "next";
import Link from "next/link";
import { AuthForm } from "@/components/auth/auth-form";
import { PageIntro } from "@/components/ui/page-intro";
import { safeNextPath } from "@/lib/auth/next-path";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const next = safeNextPath((await searchParams).next);
  return (
    <section>
      <PageIntro eyebrow="Account" title="Sign in">
        <p>Sign in to keep your Fit cards and vehicles. Shop staff sign in here to reach the Counter.</p>
      </PageIntro>
      <AuthForm kind="sign-in" next={next}>
        <p>
          New here?{" "}
          <Link href={`/sign-up?next=${encodeURIComponent(next)}`} className="font-semibold text-accent underline underline-offset-4">
            Create an account
          </Link>
        </p>
      </AuthForm>
    </section>
  );
}
