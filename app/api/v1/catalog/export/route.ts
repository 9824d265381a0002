import { withRoute } from "@/lib/auth/guard";
import { exportCatalogCsv, exportFileName } from "@/lib/catalog-csv/export";
import { catalogFiltersSchema } from "@/lib/counter/catalog-filters";

/** Staff download the current catalog, or the part the Counter's filters select, as a CSV the import takes back unchanged. */
export const GET = withRoute({ role: "staff", query: catalogFiltersSchema }, async ({ db, query }) => {
  const csv = await exportCatalogCsv(db, query);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${exportFileName(new Date())}"`,
      "cache-control": "no-store",
    },
  });
});
