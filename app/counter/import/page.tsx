import type { Metadata } from "next";
import { connection } from "next/server";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { ImportGuide } from "@/components/counter/import-guide";
import { ImportPanel } from "@/components/counter/import-panel";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { readCatalogLines } from "@/lib/catalog-csv/import-plan";
import { getDb } from "@/lib/database/app-database";

export const metadata: Metadata = { title: "Import & export", robots: { index: false } };

export default async function CounterImportPage() {
  const access = await requirePageUser("/counter/import", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  await connection();
  // The preview judges brands and lines against what the server will judge them against.
  const lines = await readCatalogLines(await getDb());
  return (
    <section>
      <PageIntro eyebrow="Counter" title="Import & export">
        <p>Add or update many stock items at once from a CSV file. The file is read and checked here first; nothing is written until you press Import.</p>
      </PageIntro>
      <div className="grid grid-cols-1 gap-10 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <ImportPanel lines={lines} />
        <ImportGuide />
      </div>
    </section>
  );
}
