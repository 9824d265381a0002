import type { CsvRefusal } from "./columns";

/** all-or-nothing writes only a file without refusals; valid-rows writes the rows that passed. */
export const IMPORT_MODES = ["all-or-nothing", "valid-rows"] as const;
export type ImportMode = (typeof IMPORT_MODES)[number];

/** What an import did, or with `written: false` what it would have done. */
export interface CatalogImportReport {
  added: number;
  updated: number;
  /** Rows identical to the current item. */
  unchanged: number;
  refused: CsvRefusal[];
  written: boolean;
}
