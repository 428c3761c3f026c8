/**
 * Dead-link check of the documentation: every relative link of the Markdown guides (README.md,
 * DEVELOPERS.md, CHANGELOG.md, docs/*.md) and every local link of the generated site (docs/api/, after
 * `npm run docs`) must point to a file that exists, and a `#fragment` to an anchor of that page.
 *
 * Run: `npx tsx docs/site/checkLinks.ts` (both checks; exits 1 listing every dead link). The Markdown
 * check also runs in the test suite (tests/docs/links.test.ts).
 */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";

/** One dead link: the file it is in, the link as written, and why it is dead. */
export interface DeadLink {
  file: string;
  link: string;
  reason: string;
}

/** The Markdown files whose links are checked: README.md, DEVELOPERS.md, CHANGELOG.md and every docs/*.md. */
export function markdownFiles(root: string): string[] {
  const top = ["README.md", "DEVELOPERS.md", "CHANGELOG.md"].map((f) => join(root, f)).filter((f) => existsSync(f));
  const docs = readdirSync(join(root, "docs")).filter((f) => f.endsWith(".md")).sort().map((f) => join(root, "docs", f));
  return [...top, ...docs];
}

/** Check the relative links (and their #fragments, for Markdown targets) of the given Markdown files. */
export function checkMarkdownLinks(files: readonly string[], root: string): DeadLink[] {
  const dead: DeadLink[] = [];
  for (const file of files) {
    const text = stripCode(readFileSync(file, "utf8"));
    for (const link of markdownLinks(text)) {
      if (isExternal(link)) continue;
      const [path = "", fragment] = link.split("#", 2) as [string, string | undefined];
      const target = path === "" ? file : resolve(dirname(file), decodeURIComponent(path));
      const where = relative(root, file);
      if (!existsSync(target)) { dead.push({ file: where, link, reason: "no such file" }); continue; }
      if (fragment !== undefined && target.endsWith(".md") && !markdownAnchors(readFileSync(target, "utf8")).has(fragment)) {
        dead.push({ file: where, link, reason: `no heading with anchor #${fragment}` });
      }
    }
  }
  return dead;
}

/** Check every local href/src of the generated HTML site in `siteDir`, fragments included. */
export function checkSiteLinks(siteDir: string): DeadLink[] {
  const dead: DeadLink[] = [];
  const pages = listFiles(siteDir).filter((f) => f.endsWith(".html"));
  const anchorCache = new Map<string, Set<string>>();
  const anchorsOf = (page: string): Set<string> => {
    let ids = anchorCache.get(page);
    if (!ids) {
      ids = new Set([...readFileSync(page, "utf8").matchAll(/\s(?:id|name)="([^"]+)"/g)].map((m) => decodeEntities(m[1]!)));
      anchorCache.set(page, ids);
    }
    return ids;
  };
  for (const page of pages) {
    const html = readFileSync(page, "utf8");
    for (const m of html.matchAll(/\s(?:href|src)="([^"]*)"/g)) {
      const link = decodeEntities(m[1]!);
      if (link === "" || isExternal(link)) continue;
      const [path = "", fragment] = link.split("#", 2) as [string, string | undefined];
      let target = path === "" ? page : resolve(dirname(page), decodeURIComponent(path.split("?")[0]!));
      if (existsSync(target) && statSync(target).isDirectory()) target = join(target, "index.html");
      const where = relative(siteDir, page);
      if (!existsSync(target)) { dead.push({ file: where, link, reason: "no such file" }); continue; }
      if (fragment && target.endsWith(".html") && !anchorsOf(target).has(decodeURIComponent(fragment))) {
        dead.push({ file: where, link, reason: `no anchor #${fragment}` });
      }
    }
  }
  return dead;
}

/** `[text](link)` and `![alt](link)` targets, and reference definitions `[id]: link`. */
export function markdownLinks(text: string): string[] {
  const inline = [...text.matchAll(/\]\(\s*<?([^)\s>]+)>?(?:\s+"[^"]*")?\s*\)/g)].map((m) => m[1]!);
  const refs = [...text.matchAll(/^\s{0,3}\[[^\]]+\]:\s*<?(\S+?)>?(?:\s|$)/gm)].map((m) => m[1]!);
  return [...inline, ...refs];
}

/** Heading anchors the way the usual Markdown renderers write them (lowercase, punctuation dropped, spaces to '-'). */
export function markdownAnchors(text: string): Set<string> {
  const seen = new Map<string, number>();
  const anchors = new Set<string>();
  for (const m of stripCode(text).matchAll(/^#{1,6}\s+(.+?)\s*#*\s*$/gm)) {
    const base = m[1]!.toLowerCase().replace(/[`*_~]/g, "").replace(/[^\p{L}\p{N}\s-]/gu, "").trim().replace(/\s/g, "-");
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    anchors.add(n === 0 ? base : `${base}-${n}`);
  }
  for (const m of text.matchAll(/<a\s+(?:name|id)="([^"]+)"/g)) anchors.add(m[1]!);
  return anchors;
}

function isExternal(link: string): boolean {
  return /^[a-z][a-z0-9+.-]*:/i.test(link) || link.startsWith("//");
}

/** Blank out fenced code blocks and inline code, where `](...)` is code, not a link. */
function stripCode(text: string): string {
  return text.replace(/^(```|~~~)[^\n]*\n[\s\S]*?^\1[^\n]*$/gm, "").replace(/`[^`\n]*`/g, "");
}

function decodeEntities(s: string): string {
  return s.replace(/&amp;/g, "&").replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&lt;/g, "<").replace(/&gt;/g, ">");
}

function listFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? listFiles(join(dir, e.name)) : [join(dir, e.name)]));
}

if (process.argv[1] !== undefined && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const root = fileURLToPath(new URL("../..", import.meta.url));
  const site = join(root, "docs", "api");
  if (!existsSync(join(site, "index.html"))) {
    console.error("docs/api/index.html is missing: run `npm run docs` first");
    process.exit(1);
  }
  const md = markdownFiles(root);
  const dead = [...checkMarkdownLinks(md, root), ...checkSiteLinks(site).map((d) => ({ ...d, file: `docs/api/${d.file}` }))];
  for (const d of dead) console.error(`dead link in ${d.file}: ${d.link} (${d.reason})`);
  const pages = listFiles(site).filter((f) => f.endsWith(".html")).length;
  console.log(`links: ${md.length} Markdown files and ${pages} site pages checked, ${dead.length} dead`);
  process.exit(dead.length === 0 ? 0 : 1);
}
