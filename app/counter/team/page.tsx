import type { Metadata } from "next";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { TeamTable } from "@/components/counter/team-table";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { listTeam, teamQuerySchema } from "@/lib/team/queries";
import { readShopTimeZone } from "@/lib/shop/queries";

export const metadata: Metadata = { title: "Team · Counter", robots: { index: false } };

export default async function TeamPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePageUser("/counter/team", "admin");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="admin" />;
  const { q } = teamQuerySchema.parse(await searchParams);
  const db = await getDb();
  const [team, timeZone] = await Promise.all([listTeam(db, q), readShopTimeZone(db)]);
  return (
    <section>
      <PageIntro eyebrow="Counter · Admin" title="Team">
        <p>
          Who can use the Counter. Staff keep the catalog; admins also manage accounts and read the audit log. The shop always
          keeps at least one admin.
        </p>
      </PageIntro>
      <TeamTable accounts={team.accounts} total={team.total} search={q} currentUserId={access.user.id} timeZone={timeZone} />
    </section>
  );
}
