import { z } from "zod";
import type { ImportMode } from "@/lib/catalog-csv/import-report";

const importReportSchema = z.object({
  added: z.number().int().min(0),
  updated: z.number().int().min(0),
  unchanged: z.number().int().min(0).optional(),
  refused: z.array(z.object({ line: z.number().int(), column: z.string().nullish(), reason: z.string() })),
  written: z.boolean(),
});

export type ImportReport = z.infer<typeof importReportSchema>;

const errorBodySchema = z.object({ error: z.object({ code: z.string(), message: z.string() }) });

export type UploadOutcome = { ok: true; report: ImportReport } | { ok: false; message: string };

const NOT_REACHED = "The file did not reach the shop's server. Check the connection and press Import again.";

function readOutcome(status: number, body: string): UploadOutcome {
  let json: unknown = null;
  try {
    json = JSON.parse(body);
  } catch {
    // A body that is not JSON is answered below like any other unexpected reply.
  }
  if (status === 200) {
    const report = importReportSchema.safeParse(json);
    if (report.success) return { ok: true, report: report.data };
  }
  const error = errorBodySchema.safeParse(json);
  if (error.success) return { ok: false, message: error.data.error.message };
  if (status === 401) return { ok: false, message: "Your session has ended. Sign in again, then import the file." };
  if (status === 413) return { ok: false, message: "The file is over the 5 MB limit. Split it into smaller CSV files." };
  return { ok: false, message: `The server could not import the file (status ${status}). Try again in a moment.` };
}

/**
 * Sends the CSV to the import endpoint. XMLHttpRequest rather than fetch because only it reports how
 * much of the body has been sent; `onProgress` gets null once the server is checking the rows.
 */
export function uploadCatalogCsv(file: File, mode: ImportMode, onProgress: (fraction: number | null) => void): Promise<UploadOutcome> {
  const form = new FormData();
  form.append("file", file);
  form.append("mode", mode);
  return new Promise((resolve) => {
    const request = new XMLHttpRequest();
    request.open("POST", "/api/v1/catalog/import");
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded >= event.total ? null : event.loaded / event.total);
    };
    request.upload.onload = () => onProgress(null);
    request.onload = () => resolve(readOutcome(request.status, request.responseText));
    request.onerror = () => resolve({ ok: false, message: NOT_REACHED });
    request.send(form);
  });
}
