import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";
import type { SessionUser } from "@/lib/auth/session";

/** What a signed-in account without the needed role sees instead of a Counter page. */
export function CounterRefusal({ user, needed, why }: { user: SessionUser; needed: "staff" | "admin"; why?: string }) {
  const title = needed === "admin" ? "This Counter page is for admins" : "The Counter is for shop staff";
  return (
    <section>
      <PageIntro eyebrow="403 · Not for this account" title={title}>
        {why ? <p>{why}</p> : null}
        <p>
          You are signed in as {user.email}, a {user.role} account. Ask the shop if you should have {needed} access.
        </p>
      </PageIntro>
      <Link href={needed === "admin" ? "/counter" : "/account"} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        {needed === "admin" ? "Back to the Counter" : "Go to your account"}
      </Link>
    </section>
  );
}
