// TypeDoc plugin of the docs site (typedoc.json "plugin"): the guides (every docs/*.md, picked up by the
// "projectDocuments" glob, and DEVELOPERS.md) go in a "Guides" section of the sidebar, get short names and
// come in the order of the calculation chain —
// formula → reaction → extent → heat capacity → species → enthalpy → energy → flame → display — with any
// guide not listed here after them, alphabetically, named after its file. With more than one entry point the
// modules are named after their import paths (rxtherm, rxtherm/database) under "API reference".
import { Comment, CommentTag, Converter, ReflectionKind } from "typedoc";

/** File name (without .md) → sidebar name, in chain order. */
export const GUIDES = new Map([
  ["formula", "Formulas"],
  ["reaction", "Reactions"],
  ["extent", "Extents and combustion"],
  ["heat-capacity", "Heat capacity"],
  ["species", "Species data"],
  ["species-database", "Species database"],
  ["enthalpy", "Enthalpy and energy balances"],
  ["energy", "Energy balances"],
  ["flame", "Flame and equilibrium"],
  ["fired-equipment", "Fired equipment"],
  ["display", "Display and charts"],
  ["units", "Units"],
  ["command-line", "Command line"],
  ["cli", "Command line"],
  ["browser", "Browsers, Deno and bundlers"],
  ["reliability", "Reliability"],
  ["performance", "Performance"],
  ["errors", "Error codes"],
  ["DEVELOPERS", "Developing rxtherm"],
]);

const ORDER = [...GUIDES.keys()];

/** @param {import("typedoc").Application} app */
export function load(app) {
  /** @type {Map<import("typedoc").Reflection, string>} */
  const fileOf = new Map();
  app.converter.on(Converter.EVENT_CREATE_DOCUMENT, (_context, doc) => {
    const file = doc.name.split("/").pop() ?? doc.name; // TypeDoc names a document after its path, minus .md
    fileOf.set(doc, file);
    doc.name = GUIDES.get(file) ?? file.charAt(0).toUpperCase() + file.slice(1).replace(/[-_]+/g, " ");
    doc.frontmatter["category"] ??= "Guides"; // one sidebar section for the guides, first (typedoc.json categoryOrder)
  });
  // With more than one entry point (rxtherm/database...), name each module after its import path.
  app.converter.on(Converter.EVENT_CREATE_DECLARATION, (_context, refl) => {
    if (refl.kindOf(ReflectionKind.Module) && refl.parent?.isProject()) {
      refl.name = refl.name === "index" ? "rxtherm" : `rxtherm/${refl.name.replace(/\/index$/, "")}`;
    }
  });
  app.converter.on(Converter.EVENT_RESOLVE_BEGIN, (context) => {
    for (const module of context.project.children ?? []) {
      if (!module.kindOf(ReflectionKind.Module)) continue;
      module.comment ??= new Comment();
      if (module.comment.getTag("@category") === undefined) {
        module.comment.blockTags.push(new CommentTag("@category", [{ kind: "text", text: "API reference" }]));
      }
    }
  });
  app.converter.on(Converter.EVENT_RESOLVE_END, (context) => {
    const rank = (refl) => {
      const i = ORDER.indexOf(fileOf.get(refl) ?? "");
      return i === -1 ? ORDER.length : i;
    };
    const byChain = (a, b) => rank(a) - rank(b) || a.name.localeCompare(b.name);
    const project = context.project;
    project.documents?.sort(byChain);
    if (project.childrenIncludingDocuments) {
      const docs = project.childrenIncludingDocuments.filter((r) => fileOf.has(r)).sort(byChain);
      const rest = project.childrenIncludingDocuments.filter((r) => !fileOf.has(r));
      project.childrenIncludingDocuments = [...docs, ...rest];
    }
  });
}
