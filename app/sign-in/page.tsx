import type { Metadata } from "next";
import Link from "next/link";
import { AuthForm } from "@/components/auth/auth-form";
import { PageIntro } from "@/components/ui/page-intro";
import { safeNextPath } from "@/lib/auth/next-path";

export const metadata: Metadata = { title: "Sign in" };

// Rendered per request: the page to return to comes in the address.
export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { next: nextParam, reset, signedUp } = await searchParams;
  const next = safeNextPath(nextParam);
  return (
    <section>
      <PageIntro eyebrow="Account" title="Sign in">
        <p>Sign in to keep your Fit cards and vehicles. Shop staff sign in here to reach the Counter.</p>
      </PageIntro>
      {reset === "done" ? (
        <p role="status" className="mb-6 max-w-md rounded border border-accent bg-accent-soft px-4 py-3">
          Your password is changed. Sign in with the new one.
        </p>
      ) : null}
      {signedUp === "1" ? (
        <p role="status" className="mb-6 max-w-md rounded border border-accent bg-accent-soft px-4 py-3">
          Thank you. If the address was new to us, your account is ready: sign in with it below. If it already had an account, we have sent its owner an
          e-mail instead.
        </p>
      ) : null}
      <AuthForm kind="sign-in" next={next}>
        <p>
          <Link href="/forgot-password" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
            Forgot your password?
          </Link>
        </p>
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
