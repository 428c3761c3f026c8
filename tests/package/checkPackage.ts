/**
 * What `npm pack` would publish (run by .ci/package.sh after `npm run build`): `npm pack --dry-run --json`
 * must list the built entry points, every target of package.json `exports` and `bin`, the README, the
 * changelog and every guide in docs/*.md — and no source, test, bench, CI or generated-site file. Then the
 * packed tarball (path given as the first argument, if any) is unpacked and every relative link of its
 * Markdown files must resolve inside the package.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { checkMarkdownLinks } from "../../docs/site/checkLinks.js";

const root = fileURLToPath(new URL("../..", import.meta.url));
const problems: string[] = [];

const listing = JSON.parse(execFileSync("npm", ["pack", "--dry-run", "--json", "--ignore-scripts"], { cwd: root, encoding: "utf8" })) as
  { files: { path: string }[]; size: number; unpackedSize: number }[];
const pack = listing[0]!;
const files = new Set(pack.files.map((f) => f.path));

const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as {
  exports?: unknown; bin?: string | Record<string, string>; main?: string; module?: string; types?: string;
};
const required = new Set<string>(["package.json", "README.md", "CHANGELOG.md", "dist/browser/rxtherm.min.js"]);
for (const f of readdirSync(join(root, "docs"))) if (f.endsWith(".md")) required.add(`docs/${f}`);
for (const target of [pkg.main, pkg.module, pkg.types, ...exportTargets(pkg.exports), ...Object.values(binOf(pkg.bin))]) {
  if (target !== undefined) required.add(target.replace(/^\.\//, ""));
}
for (const f of required) if (!files.has(f)) problems.push(`missing from the package: ${f}`);
for (const f of files) {
  if (/^(src|tests|bench|\.ci|node_modules|docs\/(api|demo|browser|site))\//.test(f) || /\.test\.[cm]?[jt]s$/.test(f) || /(^|\/)tsconfig.*\.json$/.test(f)) {
    problems.push(`must not be in the package: ${f}`);
  }
}

const tarball = process.argv[2];
if (tarball !== undefined) {
  const dir = mkdtempSync(join(tmpdir(), "rxtherm-pack-"));
  try {
    execFileSync("tar", ["-xzf", tarball, "-C", dir]);
    const base = join(dir, "package");
    const md = [...files].filter((f) => f.endsWith(".md")).map((f) => join(base, f));
    for (const d of checkMarkdownLinks(md, base)) problems.push(`dead link in the packed ${d.file}: ${d.link} (${d.reason})`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

for (const p of problems) console.error(p);
console.log(`package: ${files.size} files, ${(pack.size / 1024).toFixed(0)} KiB packed, ${(pack.unpackedSize / 1024).toFixed(0)} KiB unpacked; ${problems.length} problems`);
process.exit(problems.length === 0 ? 0 : 1);

/** Every file path in an `exports` map (conditions and subpaths, nested). */
function exportTargets(exports: unknown): string[] {
  if (typeof exports === "string") return [exports];
  if (exports === null || typeof exports !== "object") return [];
  return Object.values(exports).flatMap(exportTargets);
}

function binOf(bin: string | Record<string, string> | undefined): Record<string, string> {
  return typeof bin === "string" ? { bin } : bin ?? {};
}
