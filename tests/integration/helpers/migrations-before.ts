import { cpSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

const MIGRATIONS = path.join(process.cwd(), "db", "migrations");

/** A copy of the migrations folder that stops just before the migration tagged `tag` (its caller removes it). */
export function migrationsBefore(tag: string): string {
  const folder = mkdtempSync(path.join(tmpdir(), "sidewise-migrations-"));
  cpSync(MIGRATIONS, folder, { recursive: true });
  const journalPath = path.join(folder, "meta", "_journal.json");
  const journal = JSON.parse(readFileSync(journalPath, "utf8")) as { entries: { tag: string }[] };
  const cut = journal.entries.findIndex((entry) => entry.tag === tag);
  if (cut < 0) throw new Error(`no migration tagged ${tag}`);
  writeFileSync(journalPath, JSON.stringify({ ...journal, entries: journal.entries.slice(0, cut) }));
  return folder;
}
