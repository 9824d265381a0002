import { NextResponse } from "next/server";
import { readBodyBytes } from "@/lib/api/body";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { importCatalogCsv } from "@/lib/catalog-csv/import";
import { catalogImportFormSchema } from "@/lib/catalog-csv/import-api";
import { IMPORT_MODES } from "@/lib/catalog-csv/import-report";
import { MAX_IMPORT_BYTES, MAX_IMPORT_SIZE_TEXT, notCsvFileMessage } from "@/lib/catalog-csv/upload";

// Room for the multipart boundaries and the other fields around the file.
const MULTIPART_ALLOWANCE_BYTES = 64 * 1024;
const tooLarge = () => apiError("too_large", `The file is larger than ${MAX_IMPORT_SIZE_TEXT}: split it into smaller files and import them one by one.`);

/** Staff import a catalog CSV (multipart/form-data, field "file", optional "mode") → 200 with what was added, updated and refused. */
export const POST = withRoute({ role: "staff" }, async ({ request, db, user }) => {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    return apiError("missing_parameter", 'The field "file" is required: send the CSV as multipart/form-data.', undefined, "file");
  }
  const read = await readBodyBytes(request, MAX_IMPORT_BYTES + MULTIPART_ALLOWANCE_BYTES);
  if (!read.ok) return tooLarge();
  let form: FormData;
  try {
    form = await new Response(read.bytes, { headers: { "content-type": contentType } }).formData();
  } catch {
    return apiError("invalid_parameter", "The body is not readable multipart/form-data: send the CSV in the field \"file\".");
  }
  const file = form.get("file");
  if (file === null) return apiError("missing_parameter", 'The field "file" is required: attach the CSV file.', undefined, "file");
  if (typeof file === "string") return apiError("invalid_parameter", 'The field "file" is invalid: attach a file, not text.', undefined, "file");
  if (file.size > MAX_IMPORT_BYTES) return tooLarge();
  const mode = catalogImportFormSchema.shape.mode.safeParse(form.get("mode") ?? undefined);
  if (!mode.success) return apiError("invalid_parameter", `The field "mode" is invalid: use ${IMPORT_MODES.join(" or ")}.`, undefined, "mode");
  const notCsv = notCsvFileMessage(file);
  if (notCsv) return apiError("unreadable", notCsv);

  const text = new TextDecoder().decode(await file.arrayBuffer());
  const result = await importCatalogCsv(db, { name: file.name || "upload.csv", text }, mode.data, user);
  return result.ok ? NextResponse.json(result.report) : apiError("unreadable", result.message);
});
