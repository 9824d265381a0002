/**
 * One row format for every bench, so `npm run bench` can print them all in one table: a figure, its
 * value, the floor measured in the same run (when the goal is a ratio), the ratio, the goal and a verdict.
 */
import { pathToFileURL } from "node:url";

export interface BenchRow {
  figure: string;
  value: number;
  unit: string;
  /** What the figure is compared with, measured in the same run (e.g. "/api/health p50"). */
  floor?: { name: string; value: number };
  /** value / floor.value, when there is a floor. */
  ratio?: number;
  /** The goal in words, e.g. "≤ 1.3 × floor" or "≥ 500,000/s". */
  goal: string;
  /** null when the figure has no goal and is only reported. */
  met: boolean | null;
}

export interface BenchOptions {
  /** Fewer runs and smaller inputs, for the combined table printed after CI's tests. */
  quick: boolean;
}

export type Bench = (options: BenchOptions) => Promise<BenchRow[]>;

export const median = (values: readonly number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
};

export const percentile = (values: readonly number[], p: number): number => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
};

/** The spread of a few runs as "lowest–highest", each figure written by `format`. */
export const formatRange = (values: readonly number[], format: (value: number) => string = String): string =>
  `${format(Math.min(...values))}–${format(Math.max(...values))}`;

/** A row whose goal is a ratio to a floor measured in the same run. */
export function ratioRow(figure: string, value: number, unit: string, floor: { name: string; value: number }, maxRatio: number): BenchRow {
  const ratio = value / floor.value;
  return { figure, value, unit, floor, ratio, goal: `≤ ${maxRatio} × floor`, met: ratio <= maxRatio };
}

const formatNumber = (value: number): string =>
  Math.abs(value) >= 1000 ? Math.round(value).toLocaleString("en-US") : Number(value.toPrecision(3)).toString();

export function formatTable(rows: readonly BenchRow[]): string {
  const header = ["figure", "value", "floor (same run)", "ratio", "goal", "verdict"];
  const cells = rows.map((row) => [
    row.figure,
    `${formatNumber(row.value)} ${row.unit}`,
    row.floor ? `${row.floor.name} ${formatNumber(row.floor.value)}` : "",
    row.ratio === undefined ? "" : `${row.ratio.toFixed(2)} ×`,
    row.goal,
    row.met === null ? "reported" : row.met ? "met" : "MISSED",
  ]);
  const widths = header.map((title, column) => Math.max(title.length, ...cells.map((line) => line[column]!.length)));
  const line = (values: string[]) => values.map((value, column) => value.padEnd(widths[column]!)).join("  ").trimEnd();
  return [line(header), line(widths.map((width) => "-".repeat(width))), ...cells.map(line)].join("\n");
}

/** True when the module at `moduleUrl` is the script node was asked to run (not imported by `npm run bench`). */
export const isMainModule = (moduleUrl: string): boolean => process.argv[1] !== undefined && pathToFileURL(process.argv[1]).href === moduleUrl;

/**
 * When the bench's module is the script being run (`npm run bench:x [-- --quick]`), runs it, prints its
 * table and sets a failing exit code when a goal is missed; imported by `npm run bench`, does nothing.
 */
export async function runIfMain(moduleUrl: string, bench: Bench): Promise<void> {
  if (!isMainModule(moduleUrl)) return;
  const rows = await bench({ quick: process.argv.includes("--quick") });
  console.log(`\n${formatTable(rows)}`);
  process.exitCode = rows.some((row) => row.met === false) ? 1 : 0;
}
