import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

export default function RequestNotFound() {
  return (
    <section>
      <PageIntro eyebrow="404 · no such request" title="There is no request with this number">
        <p>It may be mistyped. Every request the shop received is listed in the inbox.</p>
      </PageIntro>
      <Link href="/counter/requests" prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Open the requests inbox
      </Link>
    </section>
  );
}
