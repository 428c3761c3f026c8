export {};
/**
 * `npm run demo`: the library's main job on scenarios of our own. Each section lives in its
 * own file beside this one and prints a readable report.
 */
const sections: string[] = [
  // (demo sections: add "./<area>.js" here)
  "./extent.js",
  "./reaction.js",
  "./formula.js",
  "./species.js",
  "./heat-capacity.js",
  "./energy.js",
  "./speciesData.js",
  "./fired.js",
  "./flame.js",
];

console.log("rxtherm demo — invented plant scenarios, every number traceable to its data source\n");
for (const s of sections) {
  const mod = (await import(s)) as { run: () => void | Promise<void> };
  await mod.run();
  console.log("");
}
