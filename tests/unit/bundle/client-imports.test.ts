import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

/**
 * What public pages' first-load browser code may not reach through static imports. A module loaded
 * with `next/dynamic` or `import()` is a separate chunk fetched when it is shown (a form opened, a
 * panel for staff), a "use server" module is only a reference in the browser, and the staff-only
 * Counter's components never load for a visitor: those are left out.
 */
const root = process.cwd();
const forbidden = [
  { name: "zod", why: "the server validates; browser code checks with the plain rules (lib/*/…-rules, …-limits, …-state)" },
  { name: "framer-motion", why: "the drawings fetch it at the first input (components/diagram/drawing-kit.tsx)" },
  { name: "@/lib/tire", why: "the tire core's index pulls in every reader; import each function from its own module" },
];

/** The reader, Side-by-side, Plus planner and finder pages, which stay lighter still. */
const typingPages = ["reader", "compare", "plus", "finder"].map((feature) => path.join(root, "components", feature) + path.sep);
const onTypingPage = (entry: string) => typingPages.some((folder) => entry.startsWith(folder));

/** What the typing pages' first loads leave out as well; the reader however it is reached (relative imports included). */
const markingReader = {
  folder: path.join(root, "lib", "tire", "parse") + path.sep,
  why: "the server reads the address; the marking reader is fetched at the first edit (components/reader/use-on-demand.ts)",
};
const swrWhy = "the finder pages its results with a small fetch of its own (components/finder/use-alternatives.ts)";

function sourceFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const full = path.join(folder, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.tsx?$/.test(name) ? [full] : [];
  });
}

function resolveLocal(from: string, specifier: string): string | null {
  const base = specifier.startsWith("@/") ? path.join(root, specifier.slice(2)) : specifier.startsWith(".") ? path.resolve(path.dirname(from), specifier) : null;
  if (!base) return null;
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, path.join(base, "index.ts"), path.join(base, "index.tsx")]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return null;
}

/** The module specifiers a file imports for their code (type-only imports left out). */
function codeImports(file: string): string[] {
  const source = ts.createSourceFile(file, readFileSync(file, "utf8"), ts.ScriptTarget.Latest, false);
  const specifiers: string[] = [];
  for (const statement of source.statements) {
    if (ts.isImportDeclaration(statement) && ts.isStringLiteral(statement.moduleSpecifier)) {
      const clause = statement.importClause;
      const onlyTypes =
        clause?.isTypeOnly ||
        (clause && !clause.name && clause.namedBindings && ts.isNamedImports(clause.namedBindings) && clause.namedBindings.elements.length > 0 && clause.namedBindings.elements.every((element) => element.isTypeOnly));
      if (!onlyTypes) specifiers.push(statement.moduleSpecifier.text);
    } else if (ts.isExportDeclaration(statement) && statement.moduleSpecifier && ts.isStringLiteral(statement.moduleSpecifier) && !statement.isTypeOnly) {
      specifiers.push(statement.moduleSpecifier.text);
    }
  }
  return specifiers;
}

const directive = (file: string) => /^\s*["']use (client|server)["']/.exec(readFileSync(file, "utf8"))?.[1];

/** Every forbidden import reachable from `entry`, as the chain of files that leads to it. */
function forbiddenChains(entry: string): string[] {
  const cameFrom = new Map<string, string | null>([[entry, null]]);
  const queue = [entry];
  const chains: string[] = [];
  while (queue.length > 0) {
    const file = queue.shift()!;
    if (file !== entry && directive(file) === "server") continue;
    for (const specifier of codeImports(file)) {
      if (onTypingPage(entry) && (specifier === "swr" || specifier.startsWith("swr/"))) {
        chains.push(`${path.relative(root, file)} → ${specifier} (${swrWhy})`);
        continue;
      }
      const rule = forbidden.find(({ name }) => specifier === name || specifier.startsWith(`${name}/`) && name !== "@/lib/tire");
      if (rule) {
        const chain = [specifier];
        for (let at: string | null | undefined = file; at; at = cameFrom.get(at)) chain.unshift(path.relative(root, at));
        chains.push(`${chain.join(" → ")} (${rule.why})`);
        continue;
      }
      const next = resolveLocal(file, specifier);
      if (next && onTypingPage(entry) && next.startsWith(markingReader.folder)) {
        const chain = [path.relative(root, next)];
        for (let at: string | null | undefined = file; at; at = cameFrom.get(at)) chain.unshift(path.relative(root, at));
        chains.push(`${chain.join(" → ")} (${markingReader.why})`);
        continue;
      }
      if (next && !cameFrom.has(next)) {
        cameFrom.set(next, file);
        queue.push(next);
      }
    }
  }
  return chains;
}

const appFiles = [...sourceFiles(path.join(root, "components")), ...sourceFiles(path.join(root, "app"))];
const loadedLater = new Set(
  appFiles.flatMap((file) => [...readFileSync(file, "utf8").matchAll(/import\(\s*["']([^"']+)["']\s*\)/g)].map((match) => resolveLocal(file, match[1]!))),
);

const publicClientModules = appFiles
  .filter((file) => directive(file) === "client" && !loadedLater.has(file))
  .filter((file) => !file.includes(`${path.sep}counter${path.sep}`))
  .map((file) => path.relative(root, file));

describe("browser code of the public pages stays light", () => {
  it("finds the client components to check", () => {
    expect(publicClientModules).toContain(path.join("components", "shell", "site-nav.tsx"));
  });

  it.each(publicClientModules)("%s reaches no zod, no framer-motion, no SWR, not the tire core's index and not the marking reader", (file) => {
    expect(forbiddenChains(path.join(root, file))).toEqual([]);
  });
});
